/** Numbers for the sentences the engine writes: rounded, without trailing zeros. */

const SCALE = [1, 10, 100, 1000];

export function formatNumber(value: number, digits = 1): string {
  const scale = SCALE[digits] ?? 10 ** digits;
  return String(Math.round(value * scale) / scale);
}
