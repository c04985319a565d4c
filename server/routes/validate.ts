import { AnySchema, InferType, ValidationError as YupValidationError } from 'yup';
import { toFieldErrors } from '../../shared/schemas/field-errors';
import { ValidationError } from '../errors';

/**
 * The fields whose values have the wrong type, found by validating without casting: Yup's casts
 * (`trim()` on an array, say) throw a TypeError on such values instead of reporting them.
 */
async function wrongTypes(schema: AnySchema, input: unknown): Promise<ValidationError> {
  try {
    await schema.validate(input, { abortEarly: false, strict: true });
  } catch (err) {
    if (err instanceof YupValidationError) return new ValidationError(toFieldErrors(err));
  }
  return new ValidationError({ '': 'A value in the request has the wrong type.' });
}

/** The input cast by a shared schema (trimmed, lower-cased, defaulted, unknown keys dropped), or a 400 with field errors. */
export async function parseInput<S extends AnySchema>(schema: S, input: unknown): Promise<InferType<S>> {
  try {
    return await schema.validate(input ?? {}, { abortEarly: false, stripUnknown: true });
  } catch (err) {
    if (err instanceof YupValidationError) throw new ValidationError(toFieldErrors(err));
    if (err instanceof TypeError) throw await wrongTypes(schema, input ?? {});
    throw err;
  }
}
