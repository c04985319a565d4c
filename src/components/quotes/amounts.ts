/**
 * Typed amounts to the API's integers. A currency amount or a percentage typed with up to two
 * decimals is read digit by digit, so "0.1" is 10 hundredths exactly and no float ever rounds it.
 */
const HUNDREDTHS = /^(\d{1,9})(?:[.,](\d{1,2}))?$/;

/** "72.5" → 7250; null for anything but a plain amount with at most two decimals. */
export function parseHundredths(typed: string): number | null {
  const match = HUNDREDTHS.exec(typed.trim());
  if (!match) return null;
  const [, whole, fraction = ''] = match;
  return Number(whole) * 100 + Number(fraction.padEnd(2, '0'));
}

/** A typed amount of money ("72.00") in integer cents (7200). */
export const parseCents = parseHundredths;

/** A typed percentage ("7.5") in integer basis points (750). */
export const parseBasisPoints = parseHundredths;

/** Integer hundredths back to the text a field shows: 7250 → "72.50". */
export function formatHundredths(value: number): string {
  return `${Math.trunc(value / 100)}.${String(value % 100).padStart(2, '0')}`;
}

/** Basis points as a percentage without needless zeros: 2000 → "20", 750 → "7.5". */
export function formatPercent(basisPoints: number): string {
  return formatHundredths(basisPoints).replace(/\.?0+$/, '');
}
