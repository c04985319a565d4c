/**
 * The ride now against the ride after the decision: ride frequency (5g), the damping ratio the
 * same damper then gives (5h) and the preview's step figures (5i). "Now" is the bike as set now:
 * the fitted spring at its present preload and rider sag. "After" is the spring and the setting
 * the decision settles on; the preview's second curve is drawn only when that is a new spring.
 */

import type { EndResult, LoadsN } from '../types/sizing';
import type { EndModel } from './end-model';
import { computeSprungMassKg } from './loads';
import { computeDampingRatioScale, computeRideFrequencyHz, RIDE_FREQUENCY_NOTE } from './ride-frequency';
import { choosePreviewDuration, describePreviewCurve, PREVIEW_NOTE } from './ride-preview';
import type { SpringLaw } from './spring-law';

export interface RideSetting {
  spring: SpringLaw;
  preloadMm: number;
  riderSagMm: number;
}

export function assessRide(
  model: EndModel,
  loads: LoadsN,
  now: RideSetting | null,
  after: RideSetting | null,
  afterIsNewSpring: boolean,
  dampingRatio: number,
): Pick<EndResult, 'rideFrequencyHz' | 'dampingRatioScale' | 'preview'> {
  const massKg = computeSprungMassKg(loads);
  const nowRate = now ? model.wheelRateAt(now.spring, now.preloadMm, now.riderSagMm) : null;
  const afterRate = after ? model.wheelRateAt(after.spring, after.preloadMm, after.riderSagMm) : null;
  const currentHz = nowRate === null ? null : computeRideFrequencyHz(nowRate, massKg);
  const afterHz = afterRate === null ? null : computeRideFrequencyHz(afterRate, massKg);
  const scale = afterIsNewSpring && nowRate !== null && afterRate !== null ? computeDampingRatioScale(nowRate, afterRate) : null;
  const oldWn = currentHz === null ? null : 2 * Math.PI * currentHz;
  const newWn = scale === null || afterHz === null ? null : 2 * Math.PI * afterHz;
  return {
    rideFrequencyHz: { current: currentHz, after: afterHz, note: RIDE_FREQUENCY_NOTE },
    dampingRatioScale: scale,
    preview: {
      assumedDampingRatio: dampingRatio,
      old: oldWn === null ? null : describePreviewCurve(oldWn, dampingRatio),
      new: newWn === null || scale === null ? null : describePreviewCurve(newWn, dampingRatio * scale),
      durationS: previewDuration(oldWn, newWn),
      note: PREVIEW_NOTE,
    },
  };
}

/** The chart span for whichever curves there are; none without either. */
function previewDuration(oldWn: number | null, newWn: number | null): number | null {
  if (oldWn === null) return newWn === null ? null : choosePreviewDuration(newWn);
  return newWn === null ? choosePreviewDuration(oldWn) : choosePreviewDuration(oldWn, newWn);
}
