/**
 * Money arrives as integer cents; it is split into whole units and cents with integer arithmetic
 * so no float ever rounds a price. The shop's currency is EUR in the demo.
 */
export const SHOP_CURRENCY = 'EUR';

const SYMBOLS: Record<string, string> = { EUR: '€', USD: '$', GBP: '£' };

/** "€1,234.50"; "–" for no price; refuses anything but whole cents. */
export function formatMoney(cents: number | null | undefined, currency: string = SHOP_CURRENCY): string {
  if (cents === null || cents === undefined) return '–';
  if (!Number.isSafeInteger(cents)) throw new RangeError(`Money must be whole cents, got ${cents}.`);
  const sign = cents < 0 ? '-' : '';
  const absolute = Math.abs(cents);
  const units = Math.trunc(absolute / 100);
  const rest = absolute % 100;
  const grouped = String(units).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const symbol = SYMBOLS[currency];
  const amount = `${grouped}.${String(rest).padStart(2, '0')}`;
  return symbol ? `${sign}${symbol}${amount}` : `${sign}${amount} ${currency}`;
}
