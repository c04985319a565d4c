/**
 * Everything the engine answers for one end (section 5), in either mode: from the weights alone,
 * or from readings with the loads calibrated on the installed spring.
 */

import type {
  CatalogueSpring,
  EndKind,
  EndResult,
  EndWindowsPct,
  FrontRequest,
  LoadsN,
  PreloadAdvice,
  RangeMm,
  RearRequest,
  SizingContext,
  SizingWarning,
  TargetUsed,
  Verdict,
} from '../types/sizing';
import { computePreloadRange, describeAdjustment } from './adjuster';
import { rankCandidates } from './candidates';
import type { EndModel } from './end-model';
import { computeImpliedRate, isRateMismatch } from './implied-rate';
import { calibrateLoads } from './loads';
import { advisePreload } from './preload-advice';
import { findUncalibratable, measureSags, type MeasuredSags } from './readings';
import { assessRide } from './ride-assessment';
import { isDualRate, makeSpringLaw, secantRate, type SpringLaw } from './spring-law';
import { areWindowsUsable, resolveSagWindows, toPercent, type SagWindows } from './targets';
import { aimPreload, describeVerdict } from './verdict';
import {
  noteAdjusterStop,
  noteForkAir,
  noteGasForceUnknown,
  noteSingleRateEquivalent,
  noteWeightsMode,
  warnAdjusterRange,
  warnBottomedOut,
  warnCoilBind,
  warnFrictionBand,
  warnImpliedRate,
  warnNoCandidate,
  warnNoRiderLoad,
  warnNoRiderSag,
  warnRegressiveLinkage,
  warnRiderReadingBottomed,
  warnSmallStaticSag,
  warnStaticReadingToppedOut,
  warnSwappedPair,
  warnTargetInvalid,
  warnToppedOut,
  warnWindowUnreachable,
} from './warnings';

export interface EndInput {
  end: EndKind;
  model: EndModel;
  request: FrontRequest | RearRequest;
  intakeLoads: LoadsN;
  windowsPct: EndWindowsPct;
  springs: readonly CatalogueSpring[];
  dampingRatio: number;
  /** Request-level warnings every end repeats. */
  sharedWarnings: readonly SizingWarning[];
}

export function sizeEnd(input: EndInput, context: SizingContext): EndResult {
  const { end, model, request, intakeLoads } = input;
  const thresholds = context.thresholds;
  const spring = makeSpringLaw(request.rateNmm, request.secondRateNmm, request.breakMm);
  const currentPreloadMm = request.preloadMm;
  const travelMm = model.travelMm;
  const warnings: SizingWarning[] = [...input.sharedWarnings];
  noteModelLimits(end, request, spring, model, warnings);
  if (intakeLoads.riderN <= 0) warnings.push(warnNoRiderLoad(end));

  const measured = request.readings ? measureSags(request.readings) : null;
  const calibrated = measured
    ? calibrateReadings(end, model, spring, currentPreloadMm, measured, thresholds.frictionSpreadMm[end], warnings)
    : null;
  if (!measured) warnings.push(noteWeightsMode());
  const loads = calibrated ?? intakeLoads;
  const intakeTotalN = intakeLoads.staticN + intakeLoads.riderN;

  const predictedStatic = model.sagAtLoad(spring, currentPreloadMm, intakeLoads.staticN);
  const predictedRider = model.sagAtLoad(spring, currentPreloadMm, intakeTotalN);
  const staticSagMm = measured ? measured.staticSagMm : predictedStatic;
  const riderSagMm = measured ? measured.riderSagMm : predictedRider;
  if (!measured) flagPredictedSags(predictedStatic, predictedRider, thresholds.smallStaticSagMm, warnings);

  const windows = resolveSagWindows(input.windowsPct, travelMm, request.target);
  const usable = areWindowsUsable(windows);
  if (!usable) warnings.push(warnTargetInvalid());

  const installedRateNmm = secantRate(
    spring,
    model.springDeflectionAt(currentPreloadMm, staticSagMm ?? 0),
    model.springDeflectionAt(currentPreloadMm, riderSagMm ?? staticSagMm ?? 0),
  );

  const implied = measured ? computeImpliedRate(model, measured, intakeLoads) : null;
  const impliedRateNmm = implied ? implied.rateNmm : null;
  if (impliedRateNmm !== null && isRateMismatch(impliedRateNmm, installedRateNmm, thresholds.impliedRateMismatchPct)) {
    const frictionSuspect = hasWarning(warnings, 'friction-band-large');
    warnings.push(warnImpliedRate(end, impliedRateNmm, installedRateNmm, frictionSuspect));
  }

  const idealRateNmm = usable ? computeIdealRate(model, windows, loads) : null;

  const preloadRangeMm = computePreloadRange(request.adjuster, currentPreloadMm, thresholds.minCaptivePreloadMm);
  let verdict: Verdict | null = null;
  let aimRiderSagMm = windows.riderMiddleMm;
  let neededPreloadMm: number | null = null;
  let preload: PreloadAdvice | null = null;
  if (usable) {
    const aim = aimPreload(model, spring, loads, windows, preloadRangeMm);
    verdict = aim.verdict;
    aimRiderSagMm = aim.aimRiderSagMm;
    neededPreloadMm = aim.neededPreloadMm;
    if (aim.unreachable) {
      warnings.push(warnWindowUnreachable(aim.unreachable, aim.unreachable === 'rider' ? windows.riderSagMm : windows.staticSagMm));
    }
    if (aim.limitedByAdjuster && aim.middlePreloadMm !== null && neededPreloadMm !== null) {
      warnings.push(noteAdjusterStop(windows.riderMiddleMm, aim.middlePreloadMm, neededPreloadMm, aimRiderSagMm));
    }
    if (neededPreloadMm !== null) {
      const keepWindows = verdict === 'keep' ? windows : null;
      preload = advisePreload(model, spring, request, loads, neededPreloadMm, preloadRangeMm, keepWindows, thresholds, warnings);
      if (verdict === 'preload-out-of-range' || preload.limitedByRange) {
        warnings.push(warnAdjusterRange(neededPreloadMm, preloadRangeMm));
      }
    }
  }

  const ranked = rankCandidates(
    model,
    input.springs,
    loads,
    { adjuster: request.adjuster, currentPreloadMm, preloadRangeMm, windows },
    thresholds,
  );
  if (ranked.coilBound > 0) warnings.push(warnCoilBind(ranked.coilBound, thresholds.coilBindMarginMm));
  if (!ranked.best) warnings.push(warnNoCandidate(input.springs.length));

  // The current spring rides at the setting it can be given, not at a preload beyond its adjuster.
  const currentSetting =
    preload && preload.riderSagAfterMm !== null
      ? { spring, preloadMm: preload.currentMm + preload.roundedChangeMm, riderSagMm: preload.riderSagAfterMm }
      : { spring, preloadMm: currentPreloadMm, riderSagMm: riderSagMm ?? aimRiderSagMm };
  const ride = assessRide(
    model,
    loads,
    currentSetting,
    ranked.inStock ?? ranked.best,
    input.dampingRatio,
    thresholds.sameRatePct,
  );

  return {
    end,
    mode: measured ? 'readings' : 'weights',
    travelMm,
    staticSagMm,
    riderSagMm,
    staticSagPct: staticSagMm === null ? null : toPercent(staticSagMm, travelMm),
    riderSagPct: riderSagMm === null ? null : toPercent(riderSagMm, travelMm),
    frictionBandMm:
      measured && (measured.staticBandMm !== null || measured.riderBandMm !== null)
        ? { static: measured.staticBandMm, rider: measured.riderBandMm }
        : null,
    target: describeTarget(windows, travelMm, aimRiderSagMm, context),
    loads: {
      staticN: loads.staticN,
      riderN: loads.riderN,
      source: calibrated ? 'calibrated' : 'intake',
      calibrated,
      intake: intakeLoads,
    },
    installedRateNmm,
    impliedRateNmm,
    impliedRateBandNmm: implied ? implied.bandNmm : null,
    idealRateNmm,
    fromWeights: {
      staticSagMm: predictedStatic,
      riderSagMm: predictedRider,
      idealRateNmm: calibrated && usable ? computeIdealRate(model, windows, intakeLoads) : idealRateNmm,
    },
    verdict,
    verdictText: describeVerdict(
      verdict,
      installedRateNmm,
      idealRateNmm,
      preload ? describeAdjustment(request.adjuster.kind, preload) : '',
      neededPreloadMm,
      preloadRangeMm,
    ),
    preload,
    recommendation: { inStock: ranked.inStock, best: ranked.best, candidates: ranked.candidates },
    // Named one by one: V8 copies a spread in a large literal through a slow path (tens of µs).
    rideFrequencyHz: ride.rideFrequencyHz,
    dampingRatioScale: ride.dampingRatioScale,
    reboundHint: ride.reboundHint,
    preview: ride.preview,
    warnings,
  };
}

/** The single-rate spring that puts both sags in the middles of their windows under these loads. */
function computeIdealRate(model: EndModel, windows: SagWindows, loads: LoadsN): number | null {
  const fit = model.fitSingleRate(windows.staticMiddleMm, loads.staticN, windows.riderMiddleMm, loads.staticN + loads.riderN);
  return fit ? fit.rateNmm : null;
}

function hasWarning(warnings: readonly SizingWarning[], code: SizingWarning['code']): boolean {
  for (const w of warnings) if (w.code === code) return true;
  return false;
}

function noteModelLimits(
  end: EndKind,
  request: FrontRequest | RearRequest,
  spring: SpringLaw,
  model: EndModel,
  warnings: SizingWarning[],
): void {
  if (end === 'front') warnings.push(noteForkAir());
  else if ((request as RearRequest).gasForceN === undefined) warnings.push(noteGasForceUnknown());
  if (isDualRate(spring)) warnings.push(noteSingleRateEquivalent());
  if (model.regressive) warnings.push(warnRegressiveLinkage());
}

function calibrateReadings(
  end: EndKind,
  model: EndModel,
  spring: SpringLaw,
  preloadMm: number,
  measured: MeasuredSags,
  spreadLimitMm: number,
  warnings: SizingWarning[],
): LoadsN | null {
  if (measured.staticSpreadMm !== null && measured.staticSpreadMm > spreadLimitMm) {
    warnings.push(warnFrictionBand('static', measured.staticSpreadMm, spreadLimitMm));
  }
  if (measured.riderSpreadMm !== null && measured.riderSpreadMm > spreadLimitMm) {
    warnings.push(warnFrictionBand('rider', measured.riderSpreadMm, spreadLimitMm));
  }
  for (const which of measured.swappedPairs) warnings.push(warnSwappedPair(which));
  const unusable = findUncalibratable(measured, model.travelMm);
  if (unusable === 'topped-out') warnings.push(warnStaticReadingToppedOut(end));
  if (unusable === 'bottomed-out') warnings.push(warnRiderReadingBottomed(end));
  if (unusable === 'no-rider-sag') warnings.push(warnNoRiderSag());
  if (unusable) return null;
  const loads = calibrateLoads(model, spring, preloadMm, measured.staticSagMm, measured.riderSagMm);
  if (!loads) warnings.push(warnNoRiderSag());
  return loads;
}

function flagPredictedSags(
  staticSagMm: number | null,
  riderSagMm: number | null,
  smallStaticSagMm: number,
  warnings: SizingWarning[],
): void {
  if (staticSagMm === 0) warnings.push(warnToppedOut('Predicted static sag'));
  else if (staticSagMm === null) warnings.push(warnBottomedOut('Predicted static sag'));
  else if (staticSagMm < smallStaticSagMm) warnings.push(warnSmallStaticSag(staticSagMm));
  if (riderSagMm === 0) warnings.push(warnToppedOut('Predicted rider sag'));
  else if (riderSagMm === null) warnings.push(warnBottomedOut('Predicted rider sag'));
}

function describeTarget(
  windows: SagWindows,
  travelMm: number,
  aimRiderSagMm: number,
  context: SizingContext,
): TargetUsed {
  return {
    discipline: context.profile.discipline,
    label: context.profile.label,
    source: windows.source,
    riderSagMm: windows.riderSagMm,
    staticSagMm: windows.staticSagMm,
    riderSagPct: rangeToPercent(windows.riderSagMm, travelMm),
    staticSagPct: rangeToPercent(windows.staticSagMm, travelMm),
    riderMiddleMm: windows.riderMiddleMm,
    staticMiddleMm: windows.staticMiddleMm,
    aimRiderSagMm,
  };
}

function rangeToPercent(range: RangeMm, travelMm: number): RangeMm {
  return { min: toPercent(range.min, travelMm), max: toPercent(range.max, travelMm) };
}
