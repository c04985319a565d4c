import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { NewPasswordField } from '@/components/form/new-password-field';
import { TextField } from '@/components/form/text-field';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { requestPasswordReset, resetPassword } from '@/session/password-reset';
import { resetRequestSchema, resetSchema } from '@shared/schemas/auth.schema';

/** The form checks what the person types; the token comes from the link, and the server judges it. */
const newPasswordSchema = resetSchema.pick(['password']);

/** Without a token: ask for a reset link. With the token of a mailed link: choose a new password. */
export default function ResetScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return <Screen>{token ? <NewPassword token={token} /> : <RequestLink />}</Screen>;
}

function RequestLink() {
  const [sent, setSent] = useState<string>();
  return (
    <>
      <ThemedText type="title">Reset your password</ThemedText>
      {sent ? (
        <Card tone="success">
          <ThemedText role="status">{sent}</ThemedText>
          <ThemedText color="textMuted">
            The link works once, for a short while. Nothing arrived? Look in the spam folder, or
            ask again.
          </ThemedText>
        </Card>
      ) : (
        <>
          <ThemedText color="textMuted">
            Give the e-mail address of your account and we will mail you a link to choose a new
            password.
          </ThemedText>
          <Card>
            <Form
              schema={resetRequestSchema}
              initialValues={{ email: '' }}
              onSubmit={async (values) => setSent(await requestPasswordReset(values))}
            >
              <TextField
                name="email"
                label="E-mail"
                autoComplete="email"
                inputMode="email"
                autoCapitalize="none"
                autoCorrect={false}
              />
              <FormErrorBanner />
              <SubmitButton label="Mail me a link" busyLabel="Sending…" />
            </Form>
          </Card>
        </>
      )}
      <TextLink href="/sign-in">Back to sign in</TextLink>
    </>
  );
}

function NewPassword({ token }: { token: string }) {
  const [done, setDone] = useState(false);
  return (
    <>
      <ThemedText type="title">Choose a new password</ThemedText>
      {done ? (
        <Card tone="success">
          <ThemedText role="status">
            Your password is changed, and every device that was signed in is signed out.
          </ThemedText>
          <TextLink href="/sign-in">Sign in with the new password</TextLink>
        </Card>
      ) : (
        <>
          <Card>
            <Form
              schema={newPasswordSchema}
              initialValues={{ password: '' }}
              onSubmit={async ({ password }) => {
                await resetPassword({ token, password });
                setDone(true);
              }}
            >
              <NewPasswordField label="New password" />
              <FormErrorBanner />
              <SubmitButton label="Set the new password" busyLabel="Saving…" />
            </Form>
          </Card>
          <TextLink href="/reset">Ask for a new link</TextLink>
        </>
      )}
    </>
  );
}
