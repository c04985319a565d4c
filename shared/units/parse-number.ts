/**
 * Numbers as people type them: one decimal point or decimal comma ("12,5" is 12.5), surrounding
 * spaces. Thousands separators ("1 250", "1.250,5") and exponents are refused rather than guessed.
 */

const TYPED_NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)$/;

/** The number, or undefined when the text is empty or not a plain number; never NaN. */
export function parseUserNumber(input: string | number | null | undefined): number | undefined {
  if (typeof input === 'number') return Number.isFinite(input) ? input : undefined;
  if (typeof input !== 'string') return undefined;
  const text = input.trim();
  if (!TYPED_NUMBER.test(text)) return undefined;
  const value = Number(text.replace(',', '.'));
  return Number.isFinite(value) ? value : undefined;
}
