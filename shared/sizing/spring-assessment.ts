/**
 * One spring under one end's loads (section 5c): whether its rate lets some preload put both sags
 * inside their windows, and the best setting the adjuster can actually make for it. The fitted
 * spring and every catalogue candidate are judged by the same code.
 *
 * Worked in preload: the spring force rises with preload at every point of travel, so each sag
 * only falls as preload rises and each window is one band of preloads. That holds on a linkage
 * whose sag jumps past part of its travel too, where a rider sag need not map to any preload.
 */

import type { LoadsN, RangeMm } from '../types/sizing';
import type { EndModel } from './end-model';
import { chooseSettableSetting, type PreloadBands, type SettableGrid, type SettableSetting } from './settable-setting';
import type { SpringLaw } from './spring-law';
import { isInsideWindow, type SagWindows } from './targets';

export type RateFit = 'suits' | 'too-soft' | 'too-stiff';

export interface RateJudgement {
  rateFit: RateFit;
  /**
   * Unrounded preload the windows alone call for: rider sag in the middle of its window, moved
   * only as far as keeping static sag inside needs. For a rate that cannot keep both, the middle.
   * Null where no finite preload does either.
   */
  windowsAimMm: number | null;
  /** A window that no preload reaches, as the sag jumps past it. */
  unreachable: 'rider' | 'static' | null;
}

export interface SpringAssessment extends RateJudgement {
  bands: PreloadBands;
  /** The best setting the adjuster can make; null when it can make none (the captive minimum above coil-bind, say). */
  setting: SettableSetting | null;
}

/** The search for a preload gives up beyond this (mm): no spring is preloaded by a kilometre. */
const PRELOAD_SEARCH_LIMIT_MM = 1e6;
/** Bisected preloads are found to this (mm): sag moves a few times as far, still well inside a window's edge allowance. */
const PRELOAD_TOLERANCE_MM = 1e-8;

export function assessSpring(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  grid: SettableGrid,
): SpringAssessment {
  const bands = findPreloadBands(model, spring, loads, windows);
  const judgement = judgeRate(model, spring, loads, windows, bands);
  const setting = chooseSettableSetting(model, spring, loads, windows, grid, bands);
  return { rateFit: judgement.rateFit, windowsAimMm: judgement.windowsAimMm, unreachable: judgement.unreachable, bands, setting };
}

export function findPreloadBands(model: EndModel, spring: SpringLaw, loads: LoadsN, windows: SagWindows): PreloadBands {
  const totalN = loads.staticN + loads.riderN;
  return {
    rider: findPreloadBand(model, spring, totalN, windows.riderSagMm),
    static: findPreloadBand(model, spring, loads.staticN, windows.staticSagMm),
    middle: findHoldingPreload(model, spring, totalN, windows.riderMiddleMm),
    topOut: findHoldingPreload(model, spring, loads.staticN, 0),
  };
}

/** Can some preload, any preload, put both sags inside their windows? Adjusters aside (5c). */
export function judgeRate(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  bands: PreloadBands,
): RateJudgement {
  const totalN = loads.staticN + loads.riderN;
  const { rider, middle } = bands;
  const stat = bands.static;
  const middleAim = Number.isFinite(middle) ? middle : null;
  const middleUnreachable =
    middleAim !== null && !isInsideWindow(model.sagAtLoad(spring, middle, totalN), windows.riderSagMm) ? 'rider' : null;
  if (rider.max < stat.min) return { rateFit: 'too-stiff', windowsAimMm: middleAim, unreachable: middleUnreachable };
  if (rider.min > stat.max) return { rateFit: 'too-soft', windowsAimMm: middleAim, unreachable: middleUnreachable };
  const preloadMm = clamp(middle, { min: Math.max(rider.min, stat.min), max: Math.min(rider.max, stat.max) });

  // Bands that overlap yet hold no sag in its window: the sag jumps past it. A rider sag deeper
  // than its window, or a static sag shallower, leaves too much between the two (too soft, 5c).
  const riderSag = model.sagAtLoad(spring, preloadMm, totalN);
  if (!isInsideWindow(riderSag, windows.riderSagMm)) {
    const rateFit = riderSag === null || riderSag > windows.riderSagMm.max ? 'too-soft' : 'too-stiff';
    return { rateFit, windowsAimMm: middleAim, unreachable: 'rider' };
  }
  const staticSag = model.sagAtLoad(spring, preloadMm, loads.staticN);
  if (!isInsideWindow(staticSag, windows.staticSagMm)) {
    const rateFit = staticSag === null || staticSag > windows.staticSagMm.max ? 'too-stiff' : 'too-soft';
    return { rateFit, windowsAimMm: middleAim, unreachable: 'static' };
  }
  return { rateFit: 'suits', windowsAimMm: Number.isFinite(preloadMm) ? preloadMm : null, unreachable: null };
}

/** Preloads that keep the sag under this load inside the window: from its deep edge to its shallow one. */
function findPreloadBand(model: EndModel, spring: SpringLaw, loadN: number, window: RangeMm): RangeMm {
  return { min: findHoldingPreload(model, spring, loadN, window.max), max: findHoldingPreload(model, spring, loadN, window.min) };
}

/**
 * The least preload that holds the end at this sag or above it. Where no preload rests the end
 * exactly there (its sag jumps past), bisect for the preload at which it jumps.
 */
export function findHoldingPreload(model: EndModel, spring: SpringLaw, loadN: number, sagMm: number): number {
  const exact = model.preloadForSag(spring, loadN, sagMm);
  if (exact !== null) return exact;
  let holding = 0;
  let loose = 0;
  // Bracket the jump, doubling away from zero preload, then bisect it.
  if (holdsAt(model, spring, loadN, sagMm, 0)) {
    loose = -1;
    while (holdsAt(model, spring, loadN, sagMm, loose)) {
      if (loose < -PRELOAD_SEARCH_LIMIT_MM) return -Infinity;
      holding = loose;
      loose *= 2;
    }
  } else {
    holding = 1;
    while (!holdsAt(model, spring, loadN, sagMm, holding)) {
      if (holding > PRELOAD_SEARCH_LIMIT_MM) return Infinity;
      loose = holding;
      holding *= 2;
    }
  }
  while (holding - loose > PRELOAD_TOLERANCE_MM) {
    const mid = (holding + loose) / 2;
    if (mid === holding || mid === loose) break;
    if (holdsAt(model, spring, loadN, sagMm, mid)) holding = mid;
    else loose = mid;
  }
  return holding;
}

// Module-level rather than a closure: this runs for every spring of every sizing.
function holdsAt(model: EndModel, spring: SpringLaw, loadN: number, sagMm: number, preloadMm: number): boolean {
  const sag = model.sagAtLoad(spring, preloadMm, loadN);
  return sag !== null && sag <= sagMm;
}

function clamp(value: number, range: RangeMm): number {
  return Math.min(range.max, Math.max(range.min, value));
}
