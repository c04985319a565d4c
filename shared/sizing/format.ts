/** Numbers for the sentences the engine writes: rounded, without trailing zeros. */

const SCALE = [1, 10, 100, 1000];

/** Built from integers: turning a double into text is the slowest step of a sizing otherwise. */
export function formatNumber(value: number, digits = 1): string {
  const scale = SCALE[digits] ?? 10 ** digits;
  const scaled = Math.round(Math.abs(value) * scale);
  if (!Number.isSafeInteger(scaled)) return String(value);
  const sign = value < 0 && scaled !== 0 ? '-' : '';
  const whole = Math.floor(scaled / scale);
  let fraction = scaled - whole * scale;
  if (fraction === 0) return `${sign}${whole}`;
  let places = digits;
  while (fraction % 10 === 0) {
    fraction /= 10;
    places--;
  }
  return `${sign}${whole}.${String(fraction).padStart(places, '0')}`;
}
