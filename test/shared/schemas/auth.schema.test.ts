/** The shared auth schemas and the field-error helper, as the client's forms and the server both use them. */
import { ValidationError } from 'yup';
import { signUpSchema, staffCreateSchema } from '../../../shared/schemas/auth.schema';
import { toFieldErrors } from '../../../shared/schemas/field-errors';

async function errorsOf(schema: typeof signUpSchema | typeof staffCreateSchema, value: unknown): Promise<Record<string, string>> {
  try {
    await schema.validate(value, { abortEarly: false });
    return {};
  } catch (err) {
    return toFieldErrors(err as ValidationError);
  }
}

test('sign-up reports one message per field, the first rule that fails', async () => {
  expect(await errorsOf(signUpSchema, { name: ' ', email: 'not-an-email', password: 'short' })).toEqual({
    name: 'Enter a name.',
    email: 'Enter an e-mail address like name@example.com.',
    password: 'Use at least 10 characters; a few words in a row are easy to remember.',
  });
});

test('sign-up normalises the e-mail and accepts a 10-character password', async () => {
  const value = await signUpSchema.validate({ name: ' Mara ', email: ' Mara@Example.TEST ', password: '0123456789' });
  expect(value).toEqual({ name: 'Mara', email: 'mara@example.test', password: '0123456789' });
});

test('staff creation wants a known role', async () => {
  expect(await errorsOf(staffCreateSchema, { name: 'Owen', email: 'owen@example.test', password: '0123456789', role: 'owner' })).toEqual({
    role: 'Choose one of: rider, desk, counter, admin.',
  });
});

test('an error about the whole value sits under the empty key', () => {
  expect(toFieldErrors(new ValidationError('Send an object.', null, undefined))).toEqual({ '': 'Send an object.' });
});
