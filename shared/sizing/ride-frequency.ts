/**
 * Ride frequency of the sprung mass on one end (section 5g) and how a spring change moves the
 * damping ratio with the same damper (section 5h). Tyre compliance is ignored, so the figures
 * run a few per cent high.
 */

export const RIDE_FREQUENCY_NOTE =
  'Tyre compliance is ignored: the real ride frequency is about 5 % lower.';

export function computeRideFrequencyHz(wheelRateNmm: number, sprungMassKg: number): number | null {
  const hz = Math.sqrt((wheelRateNmm * 1000) / sprungMassKg) / (2 * Math.PI);
  return wheelRateNmm > 0 && sprungMassKg > 0 && Number.isFinite(hz) ? hz : null;
}

/** zeta = c / (2*sqrt(k*m)): with the same damper and mass, zeta_new / zeta_old = sqrt(k_old / k_new). */
export function computeDampingRatioScale(oldWheelRateNmm: number, newWheelRateNmm: number): number | null {
  if (!(oldWheelRateNmm > 0) || !(newWheelRateNmm > 0)) return null;
  return Math.sqrt(oldWheelRateNmm / newWheelRateNmm);
}
