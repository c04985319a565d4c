/**
 * The shared spring schemas as the counter's forms use them: the text boxes hold rates in the
 * person's unit, converted to N/mm here so the checks, and the body sent, are the server's own.
 */
import type { AnyObjectSchema, Schema } from 'yup';

import { toSi, type RateUnit } from '@shared/units';

import { withBlankNumbers } from './blank-numbers';

export const RATE_FIELDS = ['rateNmm', 'secondRateNmm'] as const;
export const OPTIONAL_SIZE_FIELDS = ['secondRateNmm', 'breakMm', 'innerDiameterMm', 'outerDiameterMm', 'wireDiameterMm'] as const;
const OPTIONAL_MONEY_FIELDS = ['priceCents', 'costCents'] as const;

/** The schema with optional numbers blank as none and both rates read in `unit`. */
export function springFormSchema<S extends AnyObjectSchema>(schema: S, unit: RateUnit, blank: null | undefined): S {
  const blanks = withBlankNumbers(schema, [...OPTIONAL_SIZE_FIELDS, ...OPTIONAL_MONEY_FIELDS], blank);
  const rates = Object.fromEntries(
    RATE_FIELDS.map((field) => [
      field,
      (blanks.fields[field] as Schema).transform((value: unknown) =>
        typeof value === 'number' && Number.isFinite(value) ? toSi(value, unit) : value,
      ),
    ]),
  );
  return blanks.shape(rates) as S;
}
