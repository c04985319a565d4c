import { AnySchema, InferType, ValidationError as YupValidationError } from 'yup';
import { toFieldErrors } from '../../shared/schemas/field-errors';
import { ValidationError } from '../errors';

/** The input cast by a shared schema (trimmed, lower-cased, defaulted, unknown keys dropped), or a 400 with field errors. */
export async function parseInput<S extends AnySchema>(schema: S, input: unknown): Promise<InferType<S>> {
  try {
    return await schema.validate(input ?? {}, { abortEarly: false, stripUnknown: true });
  } catch (err) {
    if (err instanceof YupValidationError) throw new ValidationError(toFieldErrors(err));
    throw err;
  }
}
