import { ValidationError } from 'yup';

const EXPECTED: Record<string, string> = {
  object: 'an object',
  array: 'a list',
  number: 'a number',
  string: 'text',
  boolean: 'true or false',
  date: 'a date',
};

/**
 * Yup's default type message quotes the whole value sent, pretty-printed (a nested list comes back
 * many times larger than it went); name the expected type instead, so no answer echoes what it refuses.
 */
function issueMessage(issue: ValidationError): string {
  if (issue.type !== 'typeError' || !issue.message.includes('but the final value was')) return issue.message;
  const type = String(issue.params?.type ?? '');
  const expected = EXPECTED[type] ?? `of type ${type}`;
  return issue.path ? `${issue.path} must be ${expected}.` : `The request body must be a JSON ${type || 'object'}.`;
}

/**
 * Turns a Yup error (validated with `abortEarly: false`) into one message per field path, the
 * first failing rule winning. An error about the value as a whole sits under the key ''.
 */
export function toFieldErrors(error: ValidationError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.inner.length ? error.inner : [error]) {
    const key = issue.path ?? '';
    if (!(key in fields)) fields[key] = issueMessage(issue);
  }
  return fields;
}
