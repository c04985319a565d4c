import { Formik, type FormikHelpers, type FormikValues } from 'formik';
import type { ReactNode } from 'react';
import { View } from 'react-native';
import type { AnyObjectSchema, InferType } from 'yup';

import { useTheme } from '@/theme';

import { applyServerError } from './apply-server-error';

export type FormProps<S extends AnyObjectSchema> = {
  /** A shared schema from shared/schemas, so the form checks what the server will check. */
  schema: S;
  /** What the fields hold at first; text fields hold strings, whatever the schema makes of them. */
  initialValues: FormikValues;
  /**
   * Gets the values as the schema casts them (trimmed, lower-cased, numbers parsed). Throw an
   * ApiError to report a failure: its field messages land under their fields, the rest in the
   * form's banner.
   */
  onSubmit: (values: InferType<S>, helpers: FormikHelpers<FormikValues>) => Promise<unknown>;
  children: ReactNode;
};

/** Formik over a shared Yup schema, with the server's answer mapped back onto the form. */
export function Form<S extends AnyObjectSchema>({ schema, initialValues, onSubmit, children }: FormProps<S>) {
  const { spacing } = useTheme();
  return (
    <Formik
      initialValues={initialValues}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        try {
          await onSubmit(schema.cast(values, { stripUnknown: true }), helpers);
        } catch (error) {
          applyServerError(error, values, helpers);
        }
      }}
    >
      <View style={{ gap: spacing.lg }}>{children}</View>
    </Formik>
  );
}
