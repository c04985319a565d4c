/**
 * Implied installed rate (section 5a): the single-rate spring that the intake weights and the two
 * measured sags call for. The friction band carries over as an uncertainty on it.
 */

import type { LoadsN } from '../types/sizing';
import type { EndModel } from './end-model';
import { findUncalibratable, type MeasuredSags } from './readings';

export interface ImpliedRate {
  rateNmm: number;
  /** Plus or minus, from both readings' friction bands; null without pairs. */
  bandNmm: number | null;
}

export function computeImpliedRate(model: EndModel, measured: MeasuredSags, intakeLoads: LoadsN): ImpliedRate | null {
  if (findUncalibratable(measured, model.travelMm) !== null) return null;
  const difference = measured.riderSagMm - measured.staticSagMm;
  const fit = model.fitSingleRate(
    measured.staticSagMm,
    intakeLoads.staticN,
    measured.riderSagMm,
    intakeLoads.staticN + intakeLoads.riderN,
  );
  if (!fit) return null;
  // The rate goes with 1 / (S_R - S_S): a band of b mm on that difference is b / difference of the rate.
  const bandMm = (measured.staticBandMm ?? 0) + (measured.riderBandMm ?? 0);
  return { rateNmm: fit.rateNmm, bandNmm: bandMm > 0 ? (fit.rateNmm * bandMm) / difference : null };
}

export function isRateMismatch(impliedNmm: number, installedNmm: number, limitPct: number): boolean {
  return (Math.abs(impliedNmm - installedNmm) / installedNmm) * 100 > limitPct;
}
