import { formatNumber } from '@shared/sizing/format';
import type { RateUnit } from '@shared/units';

/** Decimals that suit each rate unit: lbf/in runs to hundreds, kgf/mm to single figures. */
const RATE_DIGITS: Record<RateUnit, number> = { 'N/mm': 1, 'kgf/mm': 2, 'lbf/in': 0 };

/** "9.5 N/mm": a rate the server already converted, with its unit. */
export function formatRate(rateInUnit: number, unit: RateUnit): string {
  return `${formatNumber(rateInUnit, RATE_DIGITS[unit])} ${unit}`;
}
