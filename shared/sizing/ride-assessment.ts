/**
 * The ride with the current spring against the recommended one: ride frequency (5g), the damping
 * ratio the same damper then gives (5h) and the preview's step figures (5i). Both springs are
 * rated where they would ride: each at the setting a person can make for it, and the rider sag
 * that setting gives.
 */

import type { CandidateResult, EndResult, LoadsN } from '../types/sizing';
import type { EndModel } from './end-model';
import { computeSprungMassKg } from './loads';
import {
  chooseReboundHint,
  computeDampingRatioScale,
  computeRideFrequencyHz,
  RIDE_FREQUENCY_NOTE,
} from './ride-frequency';
import { choosePreviewDuration, describePreviewCurve, PREVIEW_NOTE } from './ride-preview';
import { makeSpringLaw, type SpringLaw } from './spring-law';

export interface RideSetting {
  spring: SpringLaw;
  preloadMm: number;
  riderSagMm: number;
}

export function assessRide(
  model: EndModel,
  loads: LoadsN,
  current: RideSetting,
  pick: CandidateResult | null,
  dampingRatio: number,
  sameRatePct: number,
): Pick<EndResult, 'rideFrequencyHz' | 'dampingRatioScale' | 'reboundHint' | 'preview'> {
  const massKg = computeSprungMassKg(loads);
  const oldRate = model.wheelRateAt(current.spring, current.preloadMm, current.riderSagMm);
  const newRate =
    pick && pick.setPreloadMm !== null && pick.riderSagMm !== null
      ? model.wheelRateAt(makeSpringLaw(pick.rateNmm, pick.secondRateNmm, pick.breakMm), pick.setPreloadMm, pick.riderSagMm)
      : null;
  const currentHz = computeRideFrequencyHz(oldRate, massKg);
  const recommendedHz = newRate === null ? null : computeRideFrequencyHz(newRate, massKg);
  const scale = newRate === null ? null : computeDampingRatioScale(oldRate, newRate);
  const oldWn = currentHz === null ? null : 2 * Math.PI * currentHz;
  const newWn = recommendedHz === null || scale === null ? null : 2 * Math.PI * recommendedHz;
  return {
    rideFrequencyHz: { current: currentHz, recommended: recommendedHz, note: RIDE_FREQUENCY_NOTE },
    dampingRatioScale: scale,
    reboundHint: scale === null || newRate === null ? null : chooseReboundHint(oldRate, newRate, sameRatePct),
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
