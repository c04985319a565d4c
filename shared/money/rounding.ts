/**
 * Integer division with a named rounding rule, for money in integer cents. Never floats: a cent
 * amount times a rate is an exact integer well inside Number's safe range, and only the one
 * division at the end rounds.
 */

function assertWhole(name: string, value: number): void {
  if (!Number.isSafeInteger(value)) throw new RangeError(`${name} must be a whole number, not ${value}`);
}

/** numerator / denominator, halves rounded away from zero (numerator >= 0, denominator > 0). */
export function divideRoundHalfUp(numerator: number, denominator: number): number {
  assertWhole('numerator', numerator);
  assertWhole('denominator', denominator);
  if (numerator < 0 || denominator <= 0) throw new RangeError('divideRoundHalfUp takes a numerator >= 0 and a denominator > 0');
  const quotient = Math.floor(numerator / denominator);
  const remainder = numerator - quotient * denominator;
  return 2 * remainder >= denominator ? quotient + 1 : quotient;
}

/** numerator / denominator, halves rounded to the even neighbour (banker's rounding). */
export function divideRoundHalfEven(numerator: number, denominator: number): number {
  assertWhole('numerator', numerator);
  assertWhole('denominator', denominator);
  if (numerator < 0 || denominator <= 0) throw new RangeError('divideRoundHalfEven takes a numerator >= 0 and a denominator > 0');
  const quotient = Math.floor(numerator / denominator);
  const twice = 2 * (numerator - quotient * denominator);
  if (twice > denominator) return quotient + 1;
  if (twice === denominator && quotient % 2 === 1) return quotient + 1;
  return quotient;
}
