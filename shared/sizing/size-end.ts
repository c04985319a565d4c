/**
 * Everything the engine answers for one end (section 5), in either mode: from the weights alone,
 * or from readings with the loads calibrated on the fitted spring; and the one decision the
 * figures add up to (section 6).
 */

import type {
  CandidateResult,
  CatalogueSpring,
  EndKind,
  EndResult,
  EndWindowsPct,
  FrontRequest,
  LoadCaseResult,
  LoadsN,
  PreloadAdvice,
  RangeMm,
  RearRequest,
  SizingContext,
  SizingWarning,
  SpringName,
  TargetUsed,
  Verdict,
} from '../types/sizing';
import { adjusterUnit, computePreloadRange, describePosition } from './adjuster';
import { findCatalogueTwin, rankCandidates, scoreMiss, type RankedCandidates } from './candidates';
import { decideEnd, type ReadingMismatch, type SpacerOption } from './decide-end';
import type { EndModel } from './end-model';
import { computeImpliedRate, isRateMismatch } from './implied-rate';
import { adviseLoadCases, type LoadCaseInput, type SoloSetting } from './load-cases';
import { calibrateFromRiderReading, calibrateLoads } from './loads';
import { advisePreload } from './preload-advice';
import { assessReadingBand, idealRateFor, type BandAssessment } from './reading-band';
import { findUncalibratable, measureSags, type MeasuredSags } from './readings';
import { assessRide, type RideSetting } from './ride-assessment';
import { chooseSettableSetting, type SettableGrid } from './settable-setting';
import { assessSpring, type SpringAssessment } from './spring-assessment';
import { isDualRate, makeSpringLaw, secantRate, type SpringLaw } from './spring-law';
import { areWindowsUsable, resolveSagWindows, toPercent, type SagWindows } from './targets';
import {
  noteAdjusterStop,
  noteForkAir,
  noteGasForceUnknown,
  noteSingleRateEquivalent,
  noteWeightsMode,
  warnAdjusterRange,
  warnBottomedOut,
  warnCoilBind,
  warnFittedCoilBind,
  warnFittedCoilBindAim,
  warnFrictionBand,
  warnImpliedRate,
  warnNoCandidate,
  warnNoRiderLoad,
  warnNoRiderSag,
  warnRegressiveLinkage,
  warnRiderReadingBottomed,
  warnRoundingOutsideWindow,
  warnSmallStaticSag,
  warnRiderLoadMismatch,
  warnStaticLoadMismatch,
  warnStaticLoadOverBound,
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
  loadCases: readonly LoadCaseInput[];
  dampingRatio: number;
  /** Request-level warnings every end repeats. */
  sharedWarnings: readonly SizingWarning[];
}

interface Calibration {
  loads: LoadsN;
  source: 'calibrated' | 'rider-reading';
  staticMaxN: number | null;
}

/** Spacers are tried up to this many lengths before giving up. */
const MAX_SPACER_TRIES = 60;

export function sizeEnd(input: EndInput, context: SizingContext): EndResult {
  const { end, model, request, intakeLoads } = input;
  const thresholds = context.thresholds;
  const spring = makeSpringLaw(request.rateNmm, request.secondRateNmm, request.breakMm);
  const installed: SpringName = { rateNmm: request.rateNmm, secondRateNmm: isDualRate(spring) ? spring.secondRateNmm : null };
  const currentPreloadMm = request.preloadMm;
  const travelMm = model.travelMm;
  const warnings: SizingWarning[] = [...input.sharedWarnings];
  noteModelLimits(end, request, spring, model, warnings);
  if (intakeLoads.riderN <= 0) warnings.push(warnNoRiderLoad(end));

  const measured = request.readings ? measureSags(request.readings) : null;
  const calibration = measured ? calibrateReadings(end, model, spring, currentPreloadMm, measured, intakeLoads, thresholds.frictionSpreadMm[end], warnings) : null;
  if (!measured) warnings.push(noteWeightsMode());
  const loads = calibration ? calibration.loads : intakeLoads;
  const intakeTotalN = intakeLoads.staticN + intakeLoads.riderN;

  const predictedStatic = model.sagAtLoad(spring, currentPreloadMm, intakeLoads.staticN);
  const predictedRider = model.sagAtLoad(spring, currentPreloadMm, intakeTotalN);
  const staticSagMm = measured ? measured.staticSagMm : predictedStatic;
  const riderSagMm = measured ? measured.riderSagMm : predictedRider;
  if (!measured) flagPredictedSags(predictedStatic, predictedRider, thresholds.smallStaticSagMm, warnings);
  else if (measured.staticSagMm > 0 && measured.staticSagMm < thresholds.smallStaticSagMm) warnings.push(warnSmallStaticSag(measured.staticSagMm, true));

  const windows = resolveSagWindows(input.windowsPct, travelMm, request.target);
  const usable = areWindowsUsable(windows);
  if (!usable) warnings.push(warnTargetInvalid());

  const installedRateNmm = secantRate(
    spring,
    model.springDeflectionAt(currentPreloadMm, staticSagMm ?? 0),
    model.springDeflectionAt(currentPreloadMm, riderSagMm ?? staticSagMm ?? 0),
  );

  const implied = measured ? computeImpliedRate(model, measured, intakeLoads) : null;
  const mismatch = findMismatch(implied, installedRateNmm, calibration, intakeLoads, thresholds.impliedRateMismatchPct);
  const frictionSuspect = warnings.some((w) => w.code === 'friction-band-large');
  if (mismatch?.kind === 'rate') warnings.push(warnImpliedRate(end, mismatch.impliedRateNmm, installedRateNmm, frictionSuspect));
  if (mismatch?.kind === 'load') warnings.push(warnRiderLoadMismatch(end, mismatch.readingN, mismatch.weighedN));
  checkStaticLoad(end, calibration, intakeLoads, thresholds.staticLoadMismatchPct, warnings);

  const idealRateNmm = usable ? idealRateFor(model, windows, loads) : null;

  const maxDeflectionMm = request.maxDeflectionMm ?? findCatalogueTwin(input.springs, request)?.maxDeflectionMm ?? null;
  const coilLimitMm = maxDeflectionMm === null ? Infinity : maxDeflectionMm - thresholds.coilBindMarginMm - model.springStrokeMm;
  if (maxDeflectionMm !== null && currentPreloadMm > coilLimitMm) {
    warnings.push(warnFittedCoilBind(maxDeflectionMm - currentPreloadMm - model.springStrokeMm, thresholds.coilBindMarginMm));
  }
  const adjusterRangeMm = computePreloadRange(request.adjuster, currentPreloadMm, thresholds.minCaptivePreloadMm);
  const rangeMm = { min: adjusterRangeMm.min, max: Math.min(adjusterRangeMm.max, coilLimitMm) };
  const grid: SettableGrid = {
    adjuster: request.adjuster,
    currentPreloadMm,
    resolution: thresholds.adjusterResolution[request.adjuster.kind],
    rangeMm,
  };

  let verdict: Verdict | null = null;
  let assessment: SpringAssessment | null = null;
  let preload: PreloadAdvice | null = null;
  let adjusterCause: 'range' | 'steps' | 'coil-bind' | null = null;
  let band: BandAssessment | null = null;
  let spacer: SpacerOption | null = null;
  if (usable) {
    assessment = assessSpring(model, spring, loads, windows, grid);
    verdict = toVerdict(assessment);
    if (assessment.unreachable) {
      warnings.push(warnWindowUnreachable(assessment.unreachable, assessment.unreachable === 'rider' ? windows.riderSagMm : windows.staticSagMm));
    }
    const setting = assessment.setting;
    if (setting) {
      preload = advisePreload({
        model,
        spring,
        adjuster: request.adjuster,
        currentPreloadMm,
        rangeMm,
        assessment: { ...assessment, setting },
        verdict,
        staticMaxN: calibration?.staticMaxN ?? null,
        maxDeflectionMm,
      });
      if (preload.staticSagAfterMm === 0) warnings.push(warnToppedOut('Static sag at the new setting'));
      if (preload.riderSagAfterMm === null) warnings.push(warnBottomedOut('Rider sag at the new setting'));
    }
    const aim = assessment.windowsAimMm;
    if (verdict === 'preload-out-of-range' && aim !== null) {
      adjusterCause = aim < adjusterRangeMm.min || aim > adjusterRangeMm.max ? 'range' : aim > coilLimitMm ? 'coil-bind' : 'steps';
      if (adjusterCause === 'range') warnings.push(warnAdjusterRange(aim, adjusterRangeMm));
      if (adjusterCause === 'coil-bind') warnings.push(warnFittedCoilBindAim(aim, coilLimitMm));
      if (adjusterCause === 'steps' && setting) {
        warnings.push(warnRoundingOutsideWindow(describePosition(adjusterUnit(request.adjuster.kind), setting.position), setting.riderSagMm, setting.staticSagMm, windows));
      }
      if (request.adjuster.kind !== 'spacer' && (adjusterCause === 'steps' || aim > adjusterRangeMm.max)) {
        spacer = findSpacer(model, spring, loads, windows, grid, assessment, aim, coilLimitMm, adjusterRangeMm, thresholds.adjusterResolution.spacer);
      }
    }
    if (verdict === 'keep' && preload?.limitedByRange && aim !== null && Number.isFinite(assessment.bands.middle) && preload.riderSagAfterMm !== null) {
      warnings.push(noteAdjusterStop(windows.riderMiddleMm, assessment.bands.middle, aim < rangeMm.min ? rangeMm.min : rangeMm.max, preload.riderSagAfterMm));
    }
    if (measured && calibration?.source === 'calibrated') {
      band = assessReadingBand(model, spring, currentPreloadMm, measured, windows, assessment.rateFit);
    }
  }

  const ranked = rankCandidates(model, input.springs, loads, { adjuster: request.adjuster, currentPreloadMm, preloadRangeMm: adjusterRangeMm, windows }, thresholds);
  if (ranked.coilBound > 0) warnings.push(warnCoilBind(ranked.coilBound, thresholds.coilBindMarginMm));
  if (!ranked.best) warnings.push(warnNoCandidate(input.springs.length));

  const decision = decideEnd({
    end,
    family: request.family,
    unit: adjusterUnit(request.adjuster.kind),
    mode: measured ? 'readings' : 'weights',
    usable,
    windows,
    installed,
    effectiveRateNmm: installedRateNmm,
    verdict,
    adjusterCause,
    neededPreloadMm: assessment?.windowsAimMm ?? null,
    rangeMm: adjusterRangeMm,
    preload,
    currentMissScore: preload ? scoreMiss(preload.riderSagAfterMm, preload.staticSagAfterMm, windows) : null,
    idealRateNmm,
    mismatch,
    frictionSuspect,
    band,
    frictionBandMm: measured ? { static: measured.staticBandMm, rider: measured.riderBandMm } : null,
    staticToppedOut:
      calibration?.source === 'rider-reading' && measured && calibration.staticMaxN !== null
        ? { riderSagMm: measured.riderSagMm, ...boundsAfter(model, spring, calibration.staticMaxN, spacer, ranked.inStock ?? ranked.best) }
        : null,
    ranked,
    spacer,
    marginalRatePct: thresholds.marginalRatePct,
    sameRatePct: thresholds.sameRatePct,
  });

  const now: RideSetting | null = riderSagMm === null ? null : { spring, preloadMm: currentPreloadMm, riderSagMm };
  const settled = settleOn(decision.kind, spring, installed, grid, adjusterRangeMm.max, coilLimitMm, preload, ranked, spacer, thresholds.coilBindMarginMm);
  const ride = assessRide(model, loads, now, settled?.ride ?? null, settled?.newSpring ?? false, input.dampingRatio);
  const loadCases: LoadCaseResult[] =
    usable && settled && input.loadCases.length > 0 ? adviseLoadCases(model, loads, settled.solo, input.loadCases, windows) : [];

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
    sagDifference: band ? band.sagDifference : null,
    target: describeTarget(windows, travelMm, aimRiderSag(model, spring, loads, preload) ?? windows.riderMiddleMm, context),
    loads: {
      staticN: loads.staticN,
      riderN: loads.riderN,
      source: calibration ? calibration.source : 'intake',
      calibrated: calibration ? calibration.loads : null,
      intake: intakeLoads,
      staticMaxN: calibration?.staticMaxN ?? null,
    },
    installedSpring: installed,
    installedRateNmm,
    impliedRateNmm: implied ? implied.rateNmm : null,
    impliedRateBandNmm: implied ? implied.bandNmm : null,
    idealRateNmm,
    idealRateBandNmm: band ? band.idealRateBandNmm : null,
    fromWeights: {
      staticSagMm: predictedStatic,
      riderSagMm: predictedRider,
      idealRateNmm: calibration && usable ? idealRateFor(model, windows, intakeLoads) : idealRateNmm,
    },
    verdict,
    verdictText: decision.text.headline,
    decision,
    preload,
    // Named one by one: V8 copies a spread in a large literal through a slow path (tens of µs).
    rideFrequencyHz: ride.rideFrequencyHz,
    dampingRatioScale: ride.dampingRatioScale,
    recommendation: { inStock: ranked.inStock, best: ranked.best, closestInStock: ranked.closestInStock, candidates: ranked.candidates },
    loadCases,
    preview: ride.preview,
    warnings,
  };
}

/**
 * Readings that disagree with the stated spring and the weights. With both readings, the rate they
 * imply (5a); with a topped-out static reading there is no rate to imply, so the total load the
 * rider reading gives on the stated spring and preload is held against the weighed total.
 */
function findMismatch(
  implied: { rateNmm: number; bandNmm: number | null } | null,
  installedRateNmm: number,
  calibration: Calibration | null,
  intake: LoadsN,
  limitPct: number,
): ReadingMismatch | null {
  if (implied) {
    return isRateMismatch(implied.rateNmm, installedRateNmm, limitPct)
      ? { kind: 'rate', impliedRateNmm: implied.rateNmm, bandNmm: implied.bandNmm, statedRateNmm: installedRateNmm }
      : null;
  }
  if (calibration?.source !== 'rider-reading') return null;
  const readingN = calibration.loads.staticN + calibration.loads.riderN;
  const weighedN = intake.staticN + intake.riderN;
  return weighedN > 0 && (Math.abs(readingN - weighedN) / weighedN) * 100 > limitPct ? { kind: 'load', readingN, weighedN } : null;
}

/**
 * The static load from the readings against the weighed one (section 6): calibrated where both
 * readings were good; with a topped-out static reading, only its bound can be held against the weights.
 */
function checkStaticLoad(end: EndKind, calibration: Calibration | null, intake: LoadsN, limitPct: number, warnings: SizingWarning[]): void {
  if (!calibration || !(intake.staticN > 0)) return;
  if (calibration.source === 'calibrated') {
    const offPct = (Math.abs(calibration.loads.staticN - intake.staticN) / intake.staticN) * 100;
    if (offPct > limitPct) warnings.push(warnStaticLoadMismatch(end, calibration.loads.staticN, intake.staticN, limitPct));
  } else if (calibration.staticMaxN !== null && intake.staticN > calibration.staticMaxN * (1 + limitPct / 100)) {
    warnings.push(warnStaticLoadOverBound(end, calibration.staticMaxN, intake.staticN));
  }
}

/** Static sag after the change, at most, at the setting the decision may advise: the spacer's, or the pick's. */
function boundsAfter(
  model: EndModel,
  spring: SpringLaw,
  staticMaxN: number,
  spacer: SpacerOption | null,
  pick: CandidateResult | null,
): { spacerMaxMm: number | null; pickMaxMm: number | null } {
  const pickLaw = pick ? makeSpringLaw(pick.rateNmm, pick.secondRateNmm, pick.breakMm) : null;
  return {
    spacerMaxMm: spacer ? model.sagAtLoad(spring, spacer.setting.preloadMm, staticMaxN) : null,
    pickMaxMm: pick && pickLaw && pick.setPreloadMm !== null ? model.sagAtLoad(pickLaw, pick.setPreloadMm, staticMaxN) : null,
  };
}

/** Rider sag at the unrounded preload the advice aims at, held to what the adjuster reaches. */
function aimRiderSag(model: EndModel, spring: SpringLaw, loads: LoadsN, preload: PreloadAdvice | null): number | null {
  if (!preload || !Number.isFinite(preload.neededMm)) return null;
  const reachable = Math.min(preload.rangeMm.max, Math.max(preload.rangeMm.min, preload.neededMm));
  return model.sagAtLoad(spring, reachable, loads.staticN + loads.riderN);
}

/** Keep only where a setting the adjuster can make puts both sags inside; a rate that suits but cannot be set is the adjuster's limit. */
function toVerdict(assessment: SpringAssessment): Verdict {
  if (assessment.setting?.fit === 'both') return 'keep';
  return assessment.rateFit === 'suits' ? 'preload-out-of-range' : assessment.rateFit;
}

/**
 * A preload spacer under the spring (in the spacer's own steps) that lets the fitted spring be set
 * inside both windows: it adds its length to the preload at every setting. Lengths from the
 * shortfall up to one adjuster step beyond it are tried; the one whose setting lands nearest the
 * middles wins, the shorter on a tie.
 */
function findSpacer(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  grid: SettableGrid,
  assessment: SpringAssessment,
  aimMm: number,
  coilLimitMm: number,
  adjusterRangeMm: RangeMm,
  spacerStepMm: number,
): SpacerOption | null {
  // Preloads that keep both sags in: a spacer shorter than the gap to the band's low end cannot help.
  const bandLowMm = Math.max(assessment.bands.rider.min, assessment.bands.static.min);
  const shortfall = Math.max(0, aimMm - adjusterRangeMm.max);
  const longest = shortfall + grid.adjuster.mmPerUnit * grid.resolution + spacerStepMm;
  const first = Math.max(1, Math.floor((bandLowMm - adjusterRangeMm.max) / spacerStepMm + 1e-9));
  let best: (SpacerOption & { score: number }) | null = null;
  for (let i = 0; i < MAX_SPACER_TRIES && (first + i) * spacerStepMm <= longest; i++) {
    const lengthMm = (first + i) * spacerStepMm;
    const shifted: SettableGrid = {
      ...grid,
      currentPreloadMm: grid.currentPreloadMm + lengthMm,
      rangeMm: { min: grid.rangeMm.min, max: Math.min(adjusterRangeMm.max + lengthMm, coilLimitMm) },
    };
    const setting = chooseSettableSetting(model, spring, loads, windows, shifted, assessment.bands);
    if (setting?.fit !== 'both') continue;
    const score = scoreMiss(setting.riderSagMm, setting.staticSagMm, windows) ?? Number.MAX_VALUE;
    if (!best || score < best.score - 1e-9) best = { lengthMm, setting, score };
  }
  return best && { lengthMm: best.lengthMm, setting: best.setting };
}

/** The spring and setting the decision settles on: what "after" rides on, and what load cases add to. */
function settleOn(
  kind: EndResult['decision']['kind'],
  spring: SpringLaw,
  installed: SpringName,
  grid: SettableGrid,
  adjusterMaxMm: number,
  coilLimitMm: number,
  preload: PreloadAdvice | null,
  ranked: RankedCandidates,
  spacer: SpacerOption | null,
  coilMarginMm: number,
): { ride: RideSetting; newSpring: boolean; solo: SoloSetting } | null {
  if (kind === 'check' || kind === 'none') return null;
  const coilLimited = grid.rangeMm.max < adjusterMaxMm;
  if (kind === 'change' && spacer) {
    // The spacer adds its length to every setting; coil-bind stays where it is.
    const shiftedMax = Math.min(adjusterMaxMm + spacer.lengthMm, coilLimitMm);
    const shifted = { ...grid, currentPreloadMm: grid.currentPreloadMm + spacer.lengthMm, rangeMm: { min: grid.rangeMm.min, max: shiftedMax } };
    if (spacer.setting.riderSagMm === null) return null;
    const ride = { spring, preloadMm: spacer.setting.preloadMm, riderSagMm: spacer.setting.riderSagMm };
    return { ride, newSpring: false, solo: { ...ride, name: installed, position: spacer.setting.position, grid: shifted, coilLimited: coilLimitMm < adjusterMaxMm + spacer.lengthMm } };
  }
  const pick = kind === 'change' ? (ranked.inStock ?? ranked.best) : null;
  if (pick && pick.setPreloadMm !== null && pick.riderSagMm !== null && pick.position !== null) {
    const law = makeSpringLaw(pick.rateNmm, pick.secondRateNmm, pick.breakMm);
    const coilLimitMm = (pick.coilBindMarginMm ?? 0) + pick.setPreloadMm - coilMarginMm;
    const pickGrid = { ...grid, rangeMm: { min: grid.rangeMm.min, max: Math.min(adjusterMaxMm, coilLimitMm) } };
    const ride = { spring: law, preloadMm: pick.setPreloadMm, riderSagMm: pick.riderSagMm };
    const name = { rateNmm: pick.rateNmm, secondRateNmm: pick.secondRateNmm };
    return { ride, newSpring: true, solo: { ...ride, name, position: pick.position, grid: pickGrid, coilLimited: coilLimitMm < adjusterMaxMm } };
  }
  if (!preload || preload.riderSagAfterMm === null) return null;
  const ride = { spring, preloadMm: preload.currentMm + preload.roundedChangeMm, riderSagMm: preload.riderSagAfterMm };
  return { ride, newSpring: false, solo: { ...ride, name: installed, position: preload.position, grid, coilLimited } };
}

function noteModelLimits(end: EndKind, request: FrontRequest | RearRequest, spring: SpringLaw, model: EndModel, warnings: SizingWarning[]): void {
  if (end === 'front') warnings.push(noteForkAir());
  else if ((request as RearRequest).gasForceN === undefined) warnings.push(noteGasForceUnknown());
  if (isDualRate(spring)) warnings.push(noteSingleRateEquivalent());
  if (model.regressive) warnings.push(warnRegressiveLinkage());
}

/**
 * Loads from the readings: both calibrated when both readings show the end off its stops; the
 * total alone when only the static reading is topped out (the rider reading still gives it).
 */
function calibrateReadings(
  end: EndKind,
  model: EndModel,
  spring: SpringLaw,
  preloadMm: number,
  measured: MeasuredSags,
  intakeLoads: LoadsN,
  spreadLimitMm: number,
  warnings: SizingWarning[],
): Calibration | null {
  if (measured.staticSpreadMm !== null && measured.staticSpreadMm > spreadLimitMm) {
    warnings.push(warnFrictionBand('static', measured.staticSpreadMm, spreadLimitMm));
  }
  if (measured.riderSpreadMm !== null && measured.riderSpreadMm > spreadLimitMm) {
    warnings.push(warnFrictionBand('rider', measured.riderSpreadMm, spreadLimitMm));
  }
  for (const which of measured.swappedPairs) warnings.push(warnSwappedPair(which));
  const unusable = findUncalibratable(measured, model.travelMm);
  if (unusable === 'topped-out') {
    warnings.push(warnStaticReadingToppedOut(end));
    const partial = calibrateFromRiderReading(model, spring, preloadMm, measured.riderSagMm, intakeLoads.staticN);
    if (!partial) warnings.push(warnNoRiderSag());
    return partial ? { loads: { staticN: partial.staticN, riderN: partial.riderN }, source: 'rider-reading', staticMaxN: partial.staticMaxN } : null;
  }
  if (unusable === 'bottomed-out') warnings.push(warnRiderReadingBottomed(end));
  if (unusable === 'no-rider-sag') warnings.push(warnNoRiderSag());
  if (unusable) return null;
  const loads = calibrateLoads(model, spring, preloadMm, measured.staticSagMm, measured.riderSagMm);
  if (!loads) warnings.push(warnNoRiderSag());
  return loads ? { loads, source: 'calibrated', staticMaxN: null } : null;
}

function flagPredictedSags(staticSagMm: number | null, riderSagMm: number | null, smallStaticSagMm: number, warnings: SizingWarning[]): void {
  if (staticSagMm === 0) warnings.push(warnToppedOut('Predicted static sag'));
  else if (staticSagMm === null) warnings.push(warnBottomedOut('Predicted static sag'));
  else if (staticSagMm < smallStaticSagMm) warnings.push(warnSmallStaticSag(staticSagMm, false));
  if (riderSagMm === 0) warnings.push(warnToppedOut('Predicted rider sag'));
  else if (riderSagMm === null) warnings.push(warnBottomedOut('Predicted rider sag'));
}

function describeTarget(windows: SagWindows, travelMm: number, aimRiderSagMm: number, context: SizingContext): TargetUsed {
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
