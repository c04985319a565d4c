/**
 * Number fields of the garage's forms: typed text through the decimal-comma parser, a range, and
 * messages that name the field and its unit. Text that is not a number stays NaN so it fails as
 * "must be a number" rather than being guessed.
 */

import { number } from 'yup';
import { parseUserNumber } from '../units/parse-number';

export interface NumberRange {
  min: number;
  max: number;
  /** The minimum itself is refused (a rate of 0). */
  aboveMin?: boolean;
  integer?: boolean;
}

function readTyped(nullable: boolean) {
  return (value: unknown, original: unknown): unknown => {
    const empty = nullable ? null : undefined;
    if (original === null) return empty;
    if (typeof original === 'string') return original.trim() === '' ? empty : (parseUserNumber(original) ?? NaN);
    return value;
  };
}

export function describeRange({ min, max, aboveMin }: NumberRange, unit: string): string {
  const suffix = unit ? ` ${unit}` : '';
  return aboveMin ? `above ${min} and at most ${max}${suffix}` : `between ${min} and ${max}${suffix}`;
}

function baseField(label: string, range: NumberRange, unit: string, nullable: boolean) {
  const rangeMessage = `${label} must be ${describeRange(range, unit)}.`;
  let field = number().transform(readTyped(nullable)).typeError(`${label} must be a number.`).max(range.max, rangeMessage);
  field = range.aboveMin ? field.moreThan(range.min, rangeMessage) : field.min(range.min, rangeMessage);
  return range.integer ? field.integer(`${label} must be a whole number.`) : field;
}

export function numberField(label: string, range: NumberRange, unit: string) {
  return baseField(label, range, unit, false).required(`${label} is missing.`);
}

export function optionalNumberField(label: string, range: NumberRange, unit: string) {
  return baseField(label, range, unit, false).optional();
}

/** Null, empty or left out all mean "none" (a single-rate spring has no second rate). */
export function nullableNumberField(label: string, range: NumberRange, unit: string) {
  return baseField(label, range, unit, true).nullable().default(null);
}
