/** The current spring's preload change, rounded to the adjuster, and the sags the rounded setting gives. */

import type { FrontRequest, LoadsN, PreloadAdvice, RangeMm, RearRequest, SizingWarning, WarningThresholds } from '../types/sizing';
import { describeAdjustment, describePosition } from './adjuster';
import type { EndModel } from './end-model';
import { chooseRoundedSetting } from './rounded-setting';
import type { SpringLaw } from './spring-law';
import type { SagWindows } from './targets';
import { warnBottomedOut, warnRoundingOutsideWindow, warnToppedOut } from './warnings';

/**
 * windows: where some preload keeps both sags inside (verdict 'keep'), the rounding must too when
 * either step of the adjuster does; null otherwise.
 */
export function advisePreload(
  model: EndModel,
  spring: SpringLaw,
  request: FrontRequest | RearRequest,
  loads: LoadsN,
  neededPreloadMm: number,
  rangeMm: RangeMm,
  windows: SagWindows | null,
  thresholds: WarningThresholds,
  warnings: SizingWarning[],
): PreloadAdvice {
  const adjuster = request.adjuster;
  const setting = chooseRoundedSetting(
    model,
    spring,
    loads,
    { adjuster, currentPreloadMm: request.preloadMm, resolution: thresholds.adjusterResolution[adjuster.kind], rangeMm },
    neededPreloadMm,
    windows,
  );
  const { plan, riderSagMm: riderSagAfterMm, staticSagMm: staticSagAfterMm } = setting;
  if (staticSagAfterMm === 0) warnings.push(warnToppedOut('Static sag at the new setting'));
  if (riderSagAfterMm === null) warnings.push(warnBottomedOut('Rider sag at the new setting'));
  if (windows && setting.insideWindows === false) {
    warnings.push(
      warnRoundingOutsideWindow(describePosition(adjuster.kind, plan.position), riderSagAfterMm, staticSagAfterMm, windows),
    );
  }
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
