/**
 * Catalogue springs for one end (section 5e): the preload each needs for the rider-sag target,
 * whether it fits the adjuster and clears coil-bind, and the sags at the setting a person would
 * make for it; ranked by how close static sag lands to its target, then by stock.
 */

import type { Adjuster, CandidateResult, CatalogueSpring, LoadsN, RangeMm, WarningThresholds } from '../types/sizing';
import { adjusterUnit } from './adjuster';
import type { EndModel } from './end-model';
import { formatNumber } from './format';
import { chooseRoundedSetting } from './rounded-setting';
import { makeSpringLaw } from './spring-law';
import { toPercent, type SagWindows } from './targets';

export interface CandidateSetting {
  adjuster: Adjuster;
  currentPreloadMm: number;
  preloadRangeMm: RangeMm;
  /** Aimed at the middles (S*, T*); the windows pick between two adjuster steps. */
  windows: SagWindows;
}

export interface RankedCandidates {
  candidates: CandidateResult[];
  best: CandidateResult | null;
  inStock: CandidateResult | null;
  /** Springs that would be feasible but for coil-bind. */
  coilBound: number;
}

type Infeasibility = { kind: 'no-preload' | 'range' | 'coil-bind'; reason: string };

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
    const { candidate, problem } = assessCandidate(model, spring, loads, setting, thresholds);
    if (problem?.kind === 'coil-bind') coilBound++;
    candidates.push(candidate);
  }
  sortCandidates(candidates, setting.windows.staticMiddleMm);
  let best: CandidateResult | null = null;
  let inStock: CandidateResult | null = null;
  for (const c of candidates) {
    if (!c.feasible) continue;
    best ??= c;
    if (c.inStock) {
      inStock = c;
      break;
    }
  }
  return { candidates, best, inStock, coilBound };
}

/**
 * Feasible first, then static sag nearest its target, then the most available, then by SKU. An
 * insertion sort with the comparison inline, since a family holds a few dozen springs and this
 * runs for every sizing: cheaper than Array.prototype.sort calling back into a fresh closure.
 */
function sortCandidates(candidates: CandidateResult[], targetStaticMm: number): void {
  for (let i = 1; i < candidates.length; i++) {
    const item = candidates[i];
    let j = i - 1;
    while (j >= 0 && compareCandidates(candidates[j], item, targetStaticMm) > 0) {
      candidates[j + 1] = candidates[j];
      j--;
    }
    candidates[j + 1] = item;
  }
}

function compareCandidates(a: CandidateResult, b: CandidateResult, targetStaticMm: number): number {
  return (
    Number(b.feasible) - Number(a.feasible) ||
    missOf(a, targetStaticMm) - missOf(b, targetStaticMm) ||
    b.available - a.available ||
    (a.sku < b.sku ? -1 : a.sku > b.sku ? 1 : 0)
  );
}

function missOf(c: CandidateResult, targetStaticMm: number): number {
  return c.staticSagMm === null ? Number.MAX_VALUE : Math.abs(c.staticSagMm - targetStaticMm);
}

function assessCandidate(
  model: EndModel,
  spring: CatalogueSpring,
  loads: LoadsN,
  setting: CandidateSetting,
  thresholds: WarningThresholds,
): { candidate: CandidateResult; problem: Infeasibility | null } {
  const law = makeSpringLaw(spring.rateNmm, spring.secondRateNmm, spring.breakMm);
  const available = spring.onHand - spring.reserved;
  const riderTargetMm = setting.windows.riderMiddleMm;
  const preloadMm = model.preloadForSag(law, loads.staticN + loads.riderN, riderTargetMm);
  const rounded =
    preloadMm === null
      ? null
      : chooseRoundedSetting(
          model,
          law,
          loads,
          {
            adjuster: setting.adjuster,
            currentPreloadMm: setting.currentPreloadMm,
            resolution: thresholds.adjusterResolution[setting.adjuster.kind],
            rangeMm: setting.preloadRangeMm,
          },
          preloadMm,
          setting.windows,
        );
  const staticSagMm = rounded ? rounded.staticSagMm : null;
  const riderSagMm = rounded ? rounded.riderSagMm : null;
  const coilBindMarginMm = preloadMm === null ? null : spring.maxDeflectionMm - (preloadMm + model.springStrokeMm);
  const problem = findInfeasibility(preloadMm, riderTargetMm, coilBindMarginMm, setting.preloadRangeMm, thresholds.coilBindMarginMm);
  const candidate: CandidateResult = {
    sku: spring.sku,
    family: spring.family,
    rateNmm: spring.rateNmm,
    secondRateNmm: spring.secondRateNmm ?? null,
    breakMm: spring.breakMm ?? null,
    preloadMm,
    preloadUnits: rounded ? rounded.plan.roundedChangeUnits : null,
    unit: adjusterUnit(setting.adjuster.kind),
    position: rounded ? rounded.plan.position : null,
    setPreloadMm: rounded ? rounded.preloadMm : null,
    staticSagMm,
    riderSagMm,
    staticSagPct: staticSagMm === null ? null : toPercent(staticSagMm, model.travelMm),
    riderSagPct: riderSagMm === null ? null : toPercent(riderSagMm, model.travelMm),
    toppedOut: staticSagMm === 0,
    coilBindMarginMm,
    available,
    inStock: available >= model.springsPerEnd,
    feasible: problem === null,
    reason: problem ? problem.reason : null,
  };
  return { candidate, problem };
}

function findInfeasibility(
  preloadMm: number | null,
  riderTargetMm: number,
  coilBindMarginMm: number | null,
  range: RangeMm,
  requiredMarginMm: number,
): Infeasibility | null {
  if (preloadMm === null || coilBindMarginMm === null) {
    return {
      kind: 'no-preload',
      reason: `No preload holds rider sag at ${formatNumber(riderTargetMm, 1)} mm on this linkage: the end comes to rest short of it, often topped out.`,
    };
  }
  if (preloadMm < range.min) {
    return {
      kind: 'range',
      reason: `Needs ${formatNumber(preloadMm, 1)} mm of preload, below the ${formatNumber(range.min, 1)} mm that keeps it captive in this adjuster.`,
    };
  }
  if (preloadMm > range.max) {
    return {
      kind: 'range',
      reason: `Needs ${formatNumber(preloadMm, 1)} mm of preload, more than the adjuster's ${formatNumber(range.max, 1)} mm.`,
    };
  }
  if (coilBindMarginMm < requiredMarginMm) {
    return {
      kind: 'coil-bind',
      reason: `Would coil-bind: ${formatNumber(coilBindMarginMm, 1)} mm left at full travel, ${formatNumber(requiredMarginMm, 1)} mm needed.`,
    };
  }
  return null;
}
