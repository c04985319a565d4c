/**
 * Catalogue springs for one end (section 5e): the preload each needs for the rider-sag target,
 * the static sag it then gives, whether it fits the adjuster and clears coil-bind; ranked by how
 * close static sag lands to its target, then by stock.
 */

import type { Adjuster, CandidateResult, CatalogueSpring, LoadsN, RangeMm, WarningThresholds } from '../types/sizing';
import { adjusterUnit, planAdjustment } from './adjuster';
import type { EndModel } from './end-model';
import { formatNumber } from './format';
import { makeSpringLaw } from './spring-law';
import { toPercent } from './targets';

export interface CandidateSetting {
  adjuster: Adjuster;
  currentPreloadMm: number;
  preloadRangeMm: RangeMm;
  riderTargetMm: number;
  staticTargetMm: number;
}

export interface RankedCandidates {
  candidates: CandidateResult[];
  best: CandidateResult | null;
  inStock: CandidateResult | null;
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
    const candidate = assessCandidate(model, spring, loads, setting, thresholds);
    if (candidate.coilBindMarginMm !== null && candidate.coilBindMarginMm < thresholds.coilBindMarginMm) {
      coilBound++;
    }
    candidates.push(candidate);
  }
  const target = setting.staticTargetMm;
  const miss = (c: CandidateResult): number =>
    c.staticSagMm === null ? Number.MAX_VALUE : Math.abs(c.staticSagMm - target);
  candidates.sort(
    (a, b) =>
      Number(b.feasible) - Number(a.feasible) ||
      miss(a) - miss(b) ||
      b.available - a.available ||
      (a.sku < b.sku ? -1 : a.sku > b.sku ? 1 : 0),
  );
  const best = candidates.find((c) => c.feasible) ?? null;
  const inStock = candidates.find((c) => c.feasible && c.inStock) ?? null;
  return { candidates, best, inStock, coilBound };
}

function assessCandidate(
  model: EndModel,
  spring: CatalogueSpring,
  loads: LoadsN,
  setting: CandidateSetting,
  thresholds: WarningThresholds,
): CandidateResult {
  const law = makeSpringLaw(spring.rateNmm, spring.secondRateNmm, spring.breakMm);
  const available = spring.onHand - spring.reserved;
  const preloadMm = model.preloadForSag(law, loads.staticN + loads.riderN, setting.riderTargetMm);
  const plan =
    preloadMm === null
      ? null
      : planAdjustment(setting.adjuster, setting.currentPreloadMm, preloadMm, thresholds.adjusterResolution[setting.adjuster.kind]);
  const staticSagMm = preloadMm === null ? null : model.sagAtLoad(law, preloadMm, loads.staticN);
  const coilBindMarginMm = preloadMm === null ? null : spring.maxDeflectionMm - (preloadMm + model.springStrokeMm);
  const reason = explainInfeasible(preloadMm, coilBindMarginMm, setting.preloadRangeMm, thresholds.coilBindMarginMm);
  return {
    sku: spring.sku,
    family: spring.family,
    rateNmm: spring.rateNmm,
    secondRateNmm: spring.secondRateNmm ?? null,
    breakMm: spring.breakMm ?? null,
    preloadMm,
    preloadUnits: plan ? plan.roundedChangeUnits : null,
    unit: adjusterUnit(setting.adjuster.kind),
    position: plan ? plan.position : null,
    staticSagMm,
    riderSagMm: preloadMm === null ? null : setting.riderTargetMm,
    staticSagPct: staticSagMm === null ? null : toPercent(staticSagMm, model.travelMm),
    riderSagPct: preloadMm === null ? null : toPercent(setting.riderTargetMm, model.travelMm),
    coilBindMarginMm,
    available,
    inStock: available >= model.springsPerEnd,
    feasible: reason === null,
    reason,
  };
}

function explainInfeasible(
  preloadMm: number | null,
  coilBindMarginMm: number | null,
  range: RangeMm,
  requiredMarginMm: number,
): string | null {
  if (preloadMm === null || coilBindMarginMm === null) return 'The linkage gives no preload for the rider-sag target.';
  if (preloadMm < range.min) {
    return `Needs ${formatNumber(preloadMm, 1)} mm of preload, below the ${formatNumber(range.min, 1)} mm that keeps it captive in this adjuster.`;
  }
  if (preloadMm > range.max) {
    return `Needs ${formatNumber(preloadMm, 1)} mm of preload, more than the adjuster's ${formatNumber(range.max, 1)} mm.`;
  }
  if (coilBindMarginMm < requiredMarginMm) {
    return `Would coil-bind: ${formatNumber(coilBindMarginMm, 1)} mm left at full travel, ${formatNumber(requiredMarginMm, 1)} mm needed.`;
  }
  return null;
}
