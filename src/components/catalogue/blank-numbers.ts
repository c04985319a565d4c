import type { AnyObjectSchema, Schema } from 'yup';

/**
 * The shared schema with its optional number fields reading an empty text box as "none": a form
 * holds text, and Yup would otherwise report '' as "must be a number".
 */
export function withBlankNumbers<S extends AnyObjectSchema>(schema: S, fields: readonly string[], blank: null | undefined): S {
  const overrides = Object.fromEntries(
    fields.map((field) => [
      field,
      (schema.fields[field] as Schema).transform((value: unknown, original: unknown) =>
        typeof original === 'string' && original.trim() === '' ? blank : value,
      ),
    ]),
  );
  return schema.shape(overrides) as S;
}
