/**
 * The readings' friction band carried through to the decision (section 1, section 6). Each loaded
 * reading's true length lies within its band, so the sag difference lies within the two bands
 * added: bounds add linearly, the worst case (Taylor, An Introduction to Error Analysis, ch. 2-3;
 * adding in quadrature is for independent random errors, which a friction band is not). The
 * readings are moved to both ends of their bands and judged again: where the rate's verdict turns,
 * the band crosses a verdict limit.
 */

import type { LoadsN, SagDifference } from '../types/sizing';
import type { EndModel } from './end-model';
import { calibrateLoads } from './loads';
import type { MeasuredSags } from './readings';
import { findPreloadBands, judgeRate, type RateFit } from './spring-assessment';
import { isDualRate, type SpringLaw } from './spring-law';
import type { SagWindows } from './targets';

export interface BandAssessment {
  sagDifference: SagDifference;
  /** Plus or minus on the ideal rate, from the readings at both ends of their bands. */
  idealRateBandNmm: number | null;
  /** Within the band the rate's verdict reads otherwise, on its soft or its stiff side. */
  crosses: 'soft' | 'stiff' | null;
}

/** The least static sag a shifted reading is calibrated at: a band that reaches the top-out is judged there. */
const LEAST_STATIC_SAG_MM = 0.01;

export function assessReadingBand(
  model: EndModel,
  spring: SpringLaw,
  preloadMm: number,
  measured: MeasuredSags,
  windows: SagWindows,
  nominal: RateFit,
): BandAssessment {
  const staticBand = measured.staticBandMm ?? 0;
  const riderBand = measured.riderBandMm ?? 0;
  const bandMm = staticBand + riderBand;
  // With a fixed ratio and one rate, rider sag minus static sag does not move with preload (5c).
  const limited = model.fixedRatio && !isDualRate(spring);
  const sagDifference: SagDifference = {
    mm: measured.riderSagMm - measured.staticSagMm,
    bandMm: bandMm > 0 ? bandMm : null,
    softLimitMm: limited ? windows.riderSagMm.max - windows.staticSagMm.min : null,
    stiffLimitMm: limited ? windows.riderSagMm.min - windows.staticSagMm.max : null,
  };
  if (bandMm <= 0) return { sagDifference, idealRateBandNmm: null, crosses: null };

  const softSide = judgeAt(model, spring, preloadMm, measured.staticSagMm - staticBand, measured.riderSagMm + riderBand, windows);
  const stiffSide = judgeAt(model, spring, preloadMm, measured.staticSagMm + staticBand, measured.riderSagMm - riderBand, windows);
  // Named by the limit crossed: the soft one lies between a spring that suits and one too soft.
  let crosses: BandAssessment['crosses'] = null;
  if (nominal === 'suits') crosses = softSide.rateFit !== 'suits' ? 'soft' : stiffSide.rateFit !== 'suits' ? 'stiff' : null;
  else if (nominal === 'too-soft') crosses = stiffSide.rateFit !== 'too-soft' ? 'soft' : null;
  else crosses = softSide.rateFit !== 'too-stiff' ? 'stiff' : null;
  const idealRateBandNmm =
    softSide.idealRateNmm !== null && stiffSide.idealRateNmm !== null ? Math.abs(softSide.idealRateNmm - stiffSide.idealRateNmm) / 2 : null;
  return { sagDifference, idealRateBandNmm, crosses };
}

interface ShiftedJudgement {
  rateFit: RateFit;
  idealRateNmm: number | null;
}

/** The verdict on the rate had the readings been these; no rider sag left over reads as infinitely stiff. */
function judgeAt(
  model: EndModel,
  spring: SpringLaw,
  preloadMm: number,
  staticSagMm: number,
  riderSagMm: number,
  windows: SagWindows,
): ShiftedJudgement {
  const staticAt = Math.max(staticSagMm, LEAST_STATIC_SAG_MM);
  const riderAt = Math.min(riderSagMm, model.travelMm * (1 - 1e-9));
  const loads = riderAt > staticAt ? calibrateLoads(model, spring, preloadMm, staticAt, riderAt) : null;
  if (!loads) return { rateFit: 'too-stiff', idealRateNmm: null };
  return { rateFit: judgeRate(model, spring, loads, windows, findPreloadBands(model, spring, loads, windows)).rateFit, idealRateNmm: idealRateFor(model, windows, loads) };
}

/** The single-rate spring that puts both sags in the middles of their windows under these loads (5d). */
export function idealRateFor(model: EndModel, windows: SagWindows, loads: LoadsN): number | null {
  const fit = model.fitSingleRate(windows.staticMiddleMm, loads.staticN, windows.riderMiddleMm, loads.staticN + loads.riderN);
  return fit ? fit.rateNmm : null;
}
