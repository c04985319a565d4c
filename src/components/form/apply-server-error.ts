import type { FormikHelpers, FormikValues } from 'formik';

import { ApiError } from '@/api/client';

/** What a form's banner shows; Formik keeps it as the form's `status`. */
export type FormStatus = { error: string } | undefined;

const UNEXPECTED =
  'Something went wrong in the app. Try again; if it keeps happening, reload the page.';

/**
 * Puts a failed submit on the form. The server names fields as the shared schemas do, so each of
 * its messages for a field the form holds goes under that field; anything else (a message for the
 * whole request, or for a field the form does not show) goes in the banner.
 */
export function applyServerError<V extends FormikValues>(
  error: unknown,
  values: V,
  { setErrors, setStatus }: Pick<FormikHelpers<V>, 'setErrors' | 'setStatus'>,
): void {
  if (!(error instanceof ApiError)) {
    // Not an answer from the server: a fault in the app, which must not pass unnoticed.
    console.error(error);
    setStatus({ error: UNEXPECTED } satisfies FormStatus);
    return;
  }
  const onForm: Record<string, string> = {};
  const elsewhere: string[] = [];
  for (const [name, message] of Object.entries(error.fields ?? {})) {
    if (name in values) onForm[name] = message;
    else elsewhere.push(message);
  }
  setErrors(onForm as Parameters<typeof setErrors>[0]);
  if (elsewhere.length > 0 || Object.keys(onForm).length === 0) {
    setStatus({ error: elsewhere.length > 0 ? elsewhere.join(' ') : error.message } satisfies FormStatus);
  }
}
