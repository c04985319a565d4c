import { ChoiceField } from '@/components/form/choice-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { useUserChanges } from '@/hooks/use-users';
import { PASSWORD_MIN, staffCreateSchema } from '@shared/schemas/auth.schema';
import type { AccountUser } from '@shared/types/account';

import { ROLE_CHOICES } from './account-controls';

const EMPTY = { name: '', email: '', role: 'desk', password: '' };

/** An account made by the admin, with any role; the person changes the password later by reset. */
export function StaffAccountForm({ onCreated }: { onCreated: (user: AccountUser) => void }) {
  const { createStaff } = useUserChanges();
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
      <SubmitButton label="Create the account" busyLabel="Creating…" />
    </Form>
  );
}
