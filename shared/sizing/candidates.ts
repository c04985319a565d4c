/**
 * Catalogue springs for one end (section 5e), each judged at the best setting a person can make
 * for it: its own captive minimum, the adjuster's stops and steps, and its coil-bind length. Ranked
 * by where that setting leaves the sags (both inside their windows first), then by how near the
 * middles they land, then by stock. Only a spring that keeps both windows is offered as a fit.
 */

import type { Adjuster, CandidateResult, CatalogueSpring, LoadsN, RangeMm, WarningThresholds } from '../types/sizing';
import { adjusterUnit } from './adjuster';
import type { EndModel } from './end-model';
import { formatNumber } from './format';
import { rankFit, type SettableSetting } from './settable-setting';
import { assessSpring } from './spring-assessment';
import { makeSpringLaw } from './spring-law';
import { toPercent, type SagWindows } from './targets';

export interface CandidateSetting {
  adjuster: Adjuster;
  currentPreloadMm: number;
  /** The adjuster's preloads, captive minimum included; each spring's coil-bind narrows it further. */
  preloadRangeMm: RangeMm;
  windows: SagWindows;
}

export interface RankedCandidates {
  candidates: CandidateResult[];
  best: CandidateResult | null;
  inStock: CandidateResult | null;
  closestInStock: CandidateResult | null;
  /** Springs whose rate would suit but for coil-bind at the preload they need. */
  coilBound: number;
}

export function rankCandidates(
  model: EndModel,
  springs: readonly CatalogueSpring[],
  loads: LoadsN,
  setting: CandidateSetting,
  thresholds: WarningThresholds,
): RankedCandidates {
  const candidates: CandidateResult[] = [];
  let coilBound = 0;
  for (const spring of springs) {
    const { candidate, coilBinds } = assessCandidate(model, spring, loads, setting, thresholds);
    if (coilBinds) coilBound++;
    candidates.push(candidate);
  }
  sortCandidates(candidates);
  let best: CandidateResult | null = null;
  let inStock: CandidateResult | null = null;
  let closestInStock: CandidateResult | null = null;
  for (const c of candidates) {
    if (c.inStock && c.fit !== null) closestInStock ??= c;
    if (!c.feasible) continue;
    best ??= c;
    if (c.inStock) inStock ??= c;
  }
  return { candidates, best, inStock, closestInStock, coilBound };
}

/**
 * The best kind of fit first, then the sags nearest the middles, then the most available, then by
 * SKU. An insertion sort with the comparison inline, since a family holds a few dozen springs and
 * this runs for every sizing: cheaper than Array.prototype.sort calling back into a fresh closure.
 */
function sortCandidates(candidates: CandidateResult[]): void {
  for (let i = 1; i < candidates.length; i++) {
    const item = candidates[i];
    let j = i - 1;
    while (j >= 0 && compareCandidates(candidates[j], item) > 0) {
      candidates[j + 1] = candidates[j];
      j--;
    }
    candidates[j + 1] = item;
  }
}

function compareCandidates(a: CandidateResult, b: CandidateResult): number {
  return (
    fitRank(a) - fitRank(b) ||
    (a.missScore ?? Number.MAX_VALUE) - (b.missScore ?? Number.MAX_VALUE) ||
    b.available - a.available ||
    (a.sku < b.sku ? -1 : a.sku > b.sku ? 1 : 0)
  );
}

function fitRank(c: CandidateResult): number {
  return c.fit === null ? 5 : rankFit(c.fit);
}

/** A catalogue spring this close in rate (share) is taken for the same spring. */
const SAME_SPRING_SHARE = 0.005;

/** A catalogue spring of the same fit and label rate: the fitted spring's coil-bind length when none is given. */
export function findCatalogueTwin(
  springs: readonly CatalogueSpring[],
  fitted: { family: string; rateNmm: number; secondRateNmm?: number | null },
): CatalogueSpring | null {
  for (const s of springs) {
    if (s.family !== fitted.family) continue;
    if (Math.abs(s.rateNmm - fitted.rateNmm) > SAME_SPRING_SHARE * fitted.rateNmm) continue;
    if ((s.secondRateNmm ?? null) !== (fitted.secondRateNmm ?? null)) continue;
    return s;
  }
  return null;
}

/** How far a setting's sags land from the middles of their windows, each in half its window's width. */
export function scoreMiss(riderSagMm: number | null, staticSagMm: number | null, windows: SagWindows): number | null {
  if (riderSagMm === null || staticSagMm === null) return null;
  const riderHalf = Math.max((windows.riderSagMm.max - windows.riderSagMm.min) / 2, MIN_HALF_WINDOW_MM);
  const staticHalf = Math.max((windows.staticSagMm.max - windows.staticSagMm.min) / 2, MIN_HALF_WINDOW_MM);
  return Math.abs(riderSagMm - windows.riderMiddleMm) / riderHalf + Math.abs(staticSagMm - windows.staticMiddleMm) / staticHalf;
}

/** A window narrower than a millimetre is scored as one, so a point target does not divide by zero. */
const MIN_HALF_WINDOW_MM = 0.5;

function assessCandidate(
  model: EndModel,
  spring: CatalogueSpring,
  loads: LoadsN,
  setting: CandidateSetting,
  thresholds: WarningThresholds,
): { candidate: CandidateResult; coilBinds: boolean } {
  const law = makeSpringLaw(spring.rateNmm, spring.secondRateNmm, spring.breakMm);
  const available = spring.onHand - spring.reserved;
  const coilLimitMm = spring.maxDeflectionMm - thresholds.coilBindMarginMm - model.springStrokeMm;
  const rangeMm = { min: setting.preloadRangeMm.min, max: Math.min(setting.preloadRangeMm.max, coilLimitMm) };
  const assessment = assessSpring(model, law, loads, setting.windows, {
    adjuster: setting.adjuster,
    currentPreloadMm: setting.currentPreloadMm,
    resolution: thresholds.adjusterResolution[setting.adjuster.kind],
    rangeMm,
  });
  const set = assessment.setting;
  const aimMm = assessment.windowsAimMm;
  const coilBinds = assessment.rateFit === 'suits' && aimMm !== null && aimMm > coilLimitMm && aimMm <= setting.preloadRangeMm.max;
  const staticSagMm = set ? set.staticSagMm : null;
  const riderSagMm = set ? set.riderSagMm : null;
  const feasible = set !== null && set.fit === 'both';
  const candidate: CandidateResult = {
    sku: spring.sku,
    family: spring.family,
    rateNmm: spring.rateNmm,
    secondRateNmm: spring.secondRateNmm ?? null,
    breakMm: spring.breakMm ?? null,
    preloadMm: aimMm,
    preloadUnits: set ? set.changeUnits : null,
    unit: adjusterUnit(setting.adjuster.kind),
    position: set ? set.position : null,
    setPreloadMm: set ? set.preloadMm : null,
    staticSagMm,
    riderSagMm,
    staticSagPct: staticSagMm === null ? null : toPercent(staticSagMm, model.travelMm),
    riderSagPct: riderSagMm === null ? null : toPercent(riderSagMm, model.travelMm),
    fit: set ? set.fit : null,
    toppedOut: staticSagMm === 0,
    coilBindMarginMm: set ? spring.maxDeflectionMm - (set.preloadMm + model.springStrokeMm) : null,
    available,
    inStock: available >= model.springsPerEnd,
    feasible,
    missScore: set ? scoreMiss(riderSagMm, staticSagMm, setting.windows) : null,
    reason: feasible ? null : explainMiss(set, rangeMm, setting.windows, coilBinds, thresholds.coilBindMarginMm),
  };
  return { candidate, coilBinds };
}

function explainMiss(
  set: SettableSetting | null,
  rangeMm: RangeMm,
  windows: SagWindows,
  coilBinds: boolean,
  coilMarginMm: number,
): string {
  if (!set) {
    return `No setting can be made for it: ${mm(rangeMm.min)} of preload keeps it captive, but coil-bind (with ${mm(coilMarginMm)} kept clear) allows at most ${mm(rangeMm.max)}.`;
  }
  const rider = describeSag('Rider', set.riderSagMm, windows.riderSagMm);
  const stat = describeSag('static', set.staticSagMm, windows.staticSagMm);
  const bind = coilBinds ? ` The preload it needs would take it within ${mm(coilMarginMm)} of coil-bind.` : '';
  return `At its best setting: ${rider}; ${stat}.${bind}`;
}

function describeSag(which: string, sagMm: number | null, window: RangeMm): string {
  const range = `window ${formatNumber(window.min, 1)} to ${mm(window.max)}`;
  if (sagMm === null) return `${which} sag bottoms the end (${range})`;
  if (sagMm === 0) return `${which} sag 0, topped out (${range})`;
  return `${which} sag ${mm(sagMm)} (${range})`;
}

function mm(value: number): string {
  return `${formatNumber(value, 1)} mm`;
}
