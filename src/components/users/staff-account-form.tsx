import { StyleSheet, View } from 'react-native';

import { ChoiceField } from '@/components/form/choice-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { useUserChanges } from '@/hooks/use-users';
import { useTheme } from '@/theme';
import { PASSWORD_MIN, staffCreateSchema } from '@shared/schemas/auth.schema';
import type { AccountUser } from '@shared/types/account';

import { ROLE_CHOICES } from './account-controls';

const EMPTY = { name: '', email: '', role: 'desk', password: '' };

/** An account made by the admin, with any role; the person changes the password later by reset. */
export type StaffAccountFormProps = {
  onCreated: (user: AccountUser) => void;
  onCancel: () => void;
};

export function StaffAccountForm({ onCreated, onCancel }: StaffAccountFormProps) {
  const { createStaff } = useUserChanges();
  const { spacing } = useTheme();
  return (
    <Form
      schema={staffCreateSchema}
      initialValues={EMPTY}
      onSubmit={async (values, { resetForm }) => {
        onCreated(await createStaff(values));
        resetForm();
      }}
    >
      <TextField name="name" label="Name" autoComplete="off" autoCapitalize="words" />
      <TextField
        name="email"
        label="E-mail"
        autoComplete="off"
        inputMode="email"
        autoCapitalize="none"
        autoCorrect={false}
      />
      <ChoiceField name="role" label="Role" options={ROLE_CHOICES} />
      <TextField
        name="password"
        label="First password"
        hint={`At least ${PASSWORD_MIN} characters. Hand it over in person; the new colleague can choose their own with “Forgot your password?”.`}
        secureTextEntry
        autoComplete="new-password"
      />
      <FormErrorBanner />
      <View style={[styles.actions, { gap: spacing.md }]}>
        <SubmitButton label="Create the account" busyLabel="Creating…" />
        <Button variant="secondary" label="Cancel" onPress={onCancel} />
      </View>
    </Form>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap' },
});
