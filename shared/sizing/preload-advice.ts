/** The current spring's preload change, rounded to the adjuster, and the sags the rounded setting gives. */

import type { FrontRequest, LoadsN, PreloadAdvice, RangeMm, RearRequest, SizingWarning, WarningThresholds } from '../types/sizing';
import { describeAdjustment, planAdjustment } from './adjuster';
import type { EndModel } from './end-model';
import type { SpringLaw } from './spring-law';
import { warnBottomedOut, warnToppedOut } from './warnings';

export function advisePreload(
  model: EndModel,
  spring: SpringLaw,
  request: FrontRequest | RearRequest,
  loads: LoadsN,
  neededPreloadMm: number,
  rangeMm: RangeMm,
  thresholds: WarningThresholds,
  warnings: SizingWarning[],
): PreloadAdvice {
  const adjuster = request.adjuster;
  const plan = planAdjustment(
    adjuster,
    request.preloadMm,
    neededPreloadMm,
    thresholds.adjusterResolution[adjuster.kind],
  );
  const setMm = request.preloadMm + plan.roundedChangeMm;
  const riderSagAfterMm = model.sagAtLoad(spring, setMm, loads.staticN + loads.riderN);
  const staticSagAfterMm = model.sagAtLoad(spring, setMm, loads.staticN);
  if (staticSagAfterMm === 0) warnings.push(warnToppedOut('Static sag at the new setting'));
  if (riderSagAfterMm === null) warnings.push(warnBottomedOut('Rider sag at the new setting'));
  const phrase = describeAdjustment(adjuster.kind, plan);
  return {
    currentMm: request.preloadMm,
    neededMm: neededPreloadMm,
    changeMm: plan.changeMm,
    changeUnits: plan.changeUnits,
    unit: plan.unit,
    direction: plan.direction,
    roundedChangeUnits: plan.roundedChangeUnits,
    roundedChangeMm: plan.roundedChangeMm,
    position: plan.position,
    limitedByRange: plan.limitedByRange,
    rangeMm,
    riderSagAfterMm,
    staticSagAfterMm,
    instruction: phrase.charAt(0).toUpperCase() + phrase.slice(1) + '.',
  };
}
