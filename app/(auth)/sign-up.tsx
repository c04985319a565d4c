import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { NewPasswordField } from '@/components/form/new-password-field';
import { TextField } from '@/components/form/text-field';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useSession } from '@/session/session-provider';
import { signUpSchema } from '@shared/schemas/auth.schema';

/** A rider's own account; the shop's staff get theirs from the admin. */
export default function SignUpScreen() {
  const { signUp } = useSession();
  return (
    <Screen>
      <ThemedText type="title">Create an account</ThemedText>
      <ThemedText color="textMuted">
        A rider account keeps your bikes, measurements and set-ups. Staff accounts come from the
        shop&apos;s admin.
      </ThemedText>
      <Card>
        <Form
          schema={signUpSchema}
          initialValues={{ name: '', email: '', password: '' }}
          onSubmit={signUp}
        >
          <TextField name="name" label="Name" autoComplete="name" autoCapitalize="words" />
          <TextField
            name="email"
            label="E-mail"
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            autoCorrect={false}
          />
          <NewPasswordField label="Password" />
          <FormErrorBanner />
          <SubmitButton label="Create account" busyLabel="Creating your account…" />
        </Form>
      </Card>
      <ThemedText>
        Already have an account? <TextLink href="/sign-in">Sign in</TextLink>
      </ThemedText>
    </Screen>
  );
}
