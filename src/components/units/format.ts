/**
 * SI values as the person reads them, and typed text back to SI. Everything is stored in mm, kg,
 * N and N/mm; the conversion happens only here, at the edge, with shared/units.
 */
import { formatNumber } from '@shared/sizing/format';
import { unitFor, type QuantityKind } from '@shared/garage/units';
import type { DisplayUnits } from '@shared/types/garage';
import { fromSi, parseUserNumber, toSi, type DisplayUnit } from '@shared/units';

export { unitFor, type QuantityKind };

/** Decimals that keep a tape or a scale reading honest in each unit. */
const DIGITS: Partial<Record<DisplayUnit, number>> = { in: 2, 'kgf/mm': 2, 'lbf/in': 0, N: 0, lbf: 0 };

export function digitsFor(unit: DisplayUnit): number {
  return DIGITS[unit] ?? 1;
}

/** The SI value in the person's unit, unrounded. */
export function toDisplay(valueSi: number, kind: QuantityKind, units: DisplayUnits): number {
  return fromSi(valueSi, unitFor(kind, units));
}

/** "312.5 mm", "12.30 in": always with its unit. */
export function formatQuantity(valueSi: number, kind: QuantityKind, units: DisplayUnits, digits?: number): string {
  const unit = unitFor(kind, units);
  return `${formatNumber(fromSi(valueSi, unit), digits ?? digitsFor(unit))} ${unit}`;
}

/** The value to put in a text box: rounded to the unit's decimals, no unit. */
export function toFieldText(valueSi: number | null | undefined, kind: QuantityKind, units: DisplayUnits): string {
  if (valueSi === null || valueSi === undefined || !Number.isFinite(valueSi)) return '';
  const unit = unitFor(kind, units);
  return formatNumber(fromSi(valueSi, unit), digitsFor(unit) + 1);
}

/**
 * Typed text (point or comma) in the person's unit, as SI. Not a number stays the text itself so
 * the shared schema reports it as "must be a number" instead of the field silently emptying.
 */
export function fromFieldText(text: string, kind: QuantityKind, units: DisplayUnits): number | string | undefined {
  if (text.trim() === '') return undefined;
  const value = parseUserNumber(text);
  return value === undefined ? text : toSi(value, unitFor(kind, units));
}
