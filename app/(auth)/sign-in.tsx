import { useLocalSearchParams } from 'expo-router';

import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useSession } from '@/session/session-provider';
import { signInSchema } from '@shared/schemas/auth.schema';

/** Where the person goes next is the auth layout's business: it moves them on once signed in. */
export default function SignInScreen() {
  const { signIn } = useSession();
  const { next } = useLocalSearchParams<{ next?: string }>();
  return (
    <Screen>
      <ThemedText type="title">Sign in</ThemedText>
      <ThemedText color="textMuted">
        {next
          ? 'That page needs an account. Sign in and you will go straight there.'
          : 'Riders see their garage and set-ups; the shop’s staff see their desk.'}
      </ThemedText>
      <Card>
        <Form schema={signInSchema} initialValues={{ email: '', password: '' }} onSubmit={signIn}>
          <TextField
            name="email"
            label="E-mail"
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            autoCorrect={false}
          />
          <TextField name="password" label="Password" secureTextEntry autoComplete="current-password" />
          <FormErrorBanner />
          <SubmitButton label="Sign in" busyLabel="Signing in…" />
        </Form>
      </Card>
      <TextLink href="/reset">Forgot your password?</TextLink>
      <ThemedText>
        New here? <TextLink href="/sign-up">Create a rider account</TextLink>
      </ThemedText>
    </Screen>
  );
}
