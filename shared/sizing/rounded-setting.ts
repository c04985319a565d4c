/**
 * The setting a person actually makes for a needed preload (section 5f), and the sags it gives.
 * The nearest step of the adjuster wins unless it puts a sag outside its window while the step on
 * the other side keeps both inside.
 */

import type { Adjuster, LoadsN, RangeMm } from '../types/sizing';
import { planAdjustments, type AdjusterPlan } from './adjuster';
import type { EndModel } from './end-model';
import type { SpringLaw } from './spring-law';
import { isInsideWindow, type SagWindows } from './targets';

export interface AdjusterSetting {
  adjuster: Adjuster;
  currentPreloadMm: number;
  /** Smallest change a person sets, in adjuster units. */
  resolution: number;
  rangeMm: RangeMm;
}

export interface RoundedSetting {
  plan: AdjusterPlan;
  preloadMm: number;
  riderSagMm: number | null;
  staticSagMm: number | null;
  /** Both sags inside their windows; null when no windows were asked about. */
  insideWindows: boolean | null;
}

export function chooseRoundedSetting(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  setting: AdjusterSetting,
  neededPreloadMm: number,
  windows: SagWindows | null,
): RoundedSetting {
  const { adjuster, currentPreloadMm, resolution, rangeMm } = setting;
  const [nearestPlan, otherPlan] = planAdjustments(adjuster, currentPreloadMm, neededPreloadMm, resolution, rangeMm);
  const nearest = settle(model, spring, loads, currentPreloadMm, windows, nearestPlan);
  if (nearest.insideWindows !== false || !otherPlan) return nearest;
  const other = settle(model, spring, loads, currentPreloadMm, windows, otherPlan);
  return other.insideWindows ? other : nearest;
}

// A module-level function rather than a closure: this runs for every candidate spring.
function settle(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  currentPreloadMm: number,
  windows: SagWindows | null,
  plan: AdjusterPlan,
): RoundedSetting {
  const preloadMm = currentPreloadMm + plan.roundedChangeMm;
  const riderSagMm = model.sagAtLoad(spring, preloadMm, loads.staticN + loads.riderN);
  const staticSagMm = model.sagAtLoad(spring, preloadMm, loads.staticN);
  const insideWindows = windows
    ? isInsideWindow(riderSagMm, windows.riderSagMm) && isInsideWindow(staticSagMm, windows.staticSagMm)
    : null;
  return { plan, preloadMm, riderSagMm, staticSagMm, insideWindows };
}
