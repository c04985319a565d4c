import { PASSWORD_MIN } from '@shared/schemas/auth.schema';

import { TextField } from './text-field';

/** A password being chosen (sign-up, reset): the length rule shown, and marked for password managers. */
export function NewPasswordField({ label }: { label: string }) {
  return (
    <TextField
      name="password"
      label={label}
      hint={`At least ${PASSWORD_MIN} characters. A few words in a row are easy to remember.`}
      secureTextEntry
      autoComplete="new-password"
    />
  );
}
