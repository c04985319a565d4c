import { ValidationError } from 'yup';

/**
 * Turns a Yup error (validated with `abortEarly: false`) into one message per field path, the
 * first failing rule winning. An error about the value as a whole sits under the key ''.
 */
export function toFieldErrors(error: ValidationError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.inner.length ? error.inner : [error]) {
    const key = issue.path ?? '';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}
