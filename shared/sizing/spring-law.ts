/**
 * Force against deflection of one coil spring: a single rate, or a dual-rate spring whose rate
 * changes at a break point of its compression. Deflection counts from the free length.
 */

export interface SpringLaw {
  rateNmm: number;
  secondRateNmm: number;
  /** Compression at which the second rate takes over; 0 with a single rate. */
  breakMm: number;
}

export function makeSpringLaw(
  rateNmm: number,
  secondRateNmm?: number | null,
  breakMm?: number | null,
): SpringLaw {
  if (secondRateNmm == null || breakMm == null) {
    return { rateNmm, secondRateNmm: rateNmm, breakMm: 0 };
  }
  return { rateNmm, secondRateNmm, breakMm };
}

export function isDualRate(spring: SpringLaw): boolean {
  return spring.breakMm > 0 && spring.secondRateNmm !== spring.rateNmm;
}

export function springForce(spring: SpringLaw, deflectionMm: number): number {
  if (deflectionMm <= spring.breakMm) return spring.rateNmm * deflectionMm;
  return spring.rateNmm * spring.breakMm + spring.secondRateNmm * (deflectionMm - spring.breakMm);
}

export function springDeflection(spring: SpringLaw, forceN: number): number {
  const breakForce = spring.rateNmm * spring.breakMm;
  if (forceN <= breakForce) return forceN / spring.rateNmm;
  return spring.breakMm + (forceN - breakForce) / spring.secondRateNmm;
}

export function springRateAt(spring: SpringLaw, deflectionMm: number): number {
  return deflectionMm < spring.breakMm ? spring.rateNmm : spring.secondRateNmm;
}

/** Average rate between two deflections: what a pair of sag readings sees. */
export function secantRate(spring: SpringLaw, fromMm: number, toMm: number): number {
  if (toMm === fromMm) return springRateAt(spring, fromMm);
  return (springForce(spring, toMm) - springForce(spring, fromMm)) / (toMm - fromMm);
}
