/**
 * Verdict with the installed spring (section 5c): can some preload put both sags inside their
 * windows, and inside the adjuster's range? Aim rider sag at the middle of its window unless that
 * pushes static sag out, then at the nearest rider sag that keeps both in.
 *
 * Worked in preload: the spring force rises with preload at every point of travel, so each sag
 * only falls as preload rises and each window is one band of preloads. That holds on a linkage
 * whose sag jumps past part of its travel too, where a rider sag need not map to any preload.
 */

import type { LoadsN, RangeMm, Verdict } from '../types/sizing';
import type { EndModel } from './end-model';
import { formatNumber } from './format';
import type { SpringLaw } from './spring-law';
import { isInsideWindow, type SagWindows } from './targets';

export interface PreloadAim {
  verdict: Verdict;
  aimRiderSagMm: number;
  neededPreloadMm: number | null;
  /** Preload that puts rider sag in the middle of its window. */
  middlePreloadMm: number | null;
  /** The adjuster's range, not the windows, moved the aim off the middle. */
  limitedByAdjuster: boolean;
  /** A window that no preload reaches, as the sag jumps past it. */
  unreachable: 'rider' | 'static' | null;
}

/** The search for a preload gives up beyond this (mm): no spring is preloaded by a kilometre. */
const PRELOAD_SEARCH_LIMIT_MM = 1e6;
/** Bisected preloads are found to this (mm): sag moves a few times as far, still well inside a window's edge allowance. */
const PRELOAD_TOLERANCE_MM = 1e-8;

export function aimPreload(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  rangeMm: RangeMm,
): PreloadAim {
  const totalN = loads.staticN + loads.riderN;
  const rider = findPreloadBand(model, spring, totalN, windows.riderSagMm);
  const stat = findPreloadBand(model, spring, loads.staticN, windows.staticSagMm);
  const middle = findHoldingPreload(model, spring, totalN, windows.riderMiddleMm);
  const aim: Aiming = { model, spring, totalN, windows, middle };
  const middleUnreachable =
    Number.isFinite(middle) && !isInsideWindow(model.sagAtLoad(spring, middle, totalN), windows.riderSagMm) ? 'rider' : null;

  if (rider.max < stat.min) return aimMisfit(aim, 'too-stiff', middleUnreachable);
  if (rider.min > stat.max) return aimMisfit(aim, 'too-soft', middleUnreachable);
  const both = { min: Math.max(rider.min, stat.min), max: Math.min(rider.max, stat.max) };
  const reachable = { min: Math.max(both.min, rangeMm.min), max: Math.min(both.max, rangeMm.max) };
  const inRange = reachable.min <= reachable.max;
  const preloadMm = clamp(middle, inRange ? reachable : both);

  // Bands that overlap yet hold no sag in its window: the sag jumps past it. A rider sag deeper
  // than its window, or a static sag shallower, leaves too much between the two (too soft, 5c).
  const riderSag = model.sagAtLoad(spring, preloadMm, totalN);
  if (!isInsideWindow(riderSag, windows.riderSagMm)) {
    return aimMisfit(aim, riderSag === null || riderSag > windows.riderSagMm.max ? 'too-soft' : 'too-stiff', 'rider');
  }
  const staticSag = model.sagAtLoad(spring, preloadMm, loads.staticN);
  if (!isInsideWindow(staticSag, windows.staticSagMm)) {
    return aimMisfit(aim, staticSag === null || staticSag > windows.staticSagMm.max ? 'too-stiff' : 'too-soft', 'static');
  }
  if (!inRange) return aimAt(aim, 'preload-out-of-range', preloadMm, null, false);
  return aimAt(aim, 'keep', preloadMm, null, preloadMm !== clamp(middle, both));
}

/** What every outcome of one aim is worked out from; module-level helpers rather than closures, as this runs for every end. */
interface Aiming {
  model: EndModel;
  spring: SpringLaw;
  totalN: number;
  windows: SagWindows;
  /** Preload that puts rider sag in the middle of its window. */
  middle: number;
}

function aimAt(
  aim: Aiming,
  verdict: Verdict,
  preloadMm: number,
  unreachable: PreloadAim['unreachable'],
  limitedByAdjuster: boolean,
): PreloadAim {
  const finite = Number.isFinite(preloadMm);
  return {
    verdict,
    aimRiderSagMm: (finite ? aim.model.sagAtLoad(aim.spring, preloadMm, aim.totalN) : null) ?? aim.windows.riderMiddleMm,
    neededPreloadMm: finite ? preloadMm : null,
    middlePreloadMm: Number.isFinite(aim.middle) ? aim.middle : null,
    limitedByAdjuster,
    unreachable,
  };
}

/** No preload serves: aim at the middle, as a spring of the right rate would be set. */
function aimMisfit(aim: Aiming, verdict: 'too-soft' | 'too-stiff', unreachable: PreloadAim['unreachable']): PreloadAim {
  const outcome = aimAt(aim, verdict, aim.middle, unreachable, false);
  outcome.aimRiderSagMm = aim.windows.riderMiddleMm;
  return outcome;
}

/** Preloads that keep the sag under this load inside the window: from its deep edge to its shallow one. */
function findPreloadBand(model: EndModel, spring: SpringLaw, loadN: number, window: RangeMm): RangeMm {
  return { min: findHoldingPreload(model, spring, loadN, window.max), max: findHoldingPreload(model, spring, loadN, window.min) };
}

/**
 * The least preload that holds the end at this sag or above it. Where no preload rests the end
 * exactly there (its sag jumps past), bisect for the preload at which it jumps.
 */
function findHoldingPreload(model: EndModel, spring: SpringLaw, loadN: number, sagMm: number): number {
  const exact = model.preloadForSag(spring, loadN, sagMm);
  if (exact !== null) return exact;
  const holds = (preloadMm: number): boolean => {
    const sag = model.sagAtLoad(spring, preloadMm, loadN);
    return sag !== null && sag <= sagMm;
  };
  // Bracket the jump, doubling away from zero preload, then bisect it.
  let holding = 0;
  let loose = 0;
  if (holds(0)) {
    loose = -1;
    while (holds(loose)) {
      if (loose < -PRELOAD_SEARCH_LIMIT_MM) return -Infinity;
      holding = loose;
      loose *= 2;
    }
  } else {
    holding = 1;
    while (!holds(holding)) {
      if (holding > PRELOAD_SEARCH_LIMIT_MM) return Infinity;
      loose = holding;
      holding *= 2;
    }
  }
  while (holding - loose > PRELOAD_TOLERANCE_MM) {
    const mid = (holding + loose) / 2;
    if (mid === holding || mid === loose) break;
    if (holds(mid)) holding = mid;
    else loose = mid;
  }
  return holding;
}

function clamp(value: number, range: RangeMm): number {
  return Math.min(range.max, Math.max(range.min, value));
}

export function describeVerdict(
  verdict: Verdict | null,
  installedRateNmm: number,
  idealRateNmm: number | null,
  adjustment: string,
  neededPreloadMm: number | null,
  rangeMm: RangeMm,
): string {
  const rate = `${formatNumber(installedRateNmm, 1)} N/mm spring`;
  const ideal = idealRateNmm === null ? '' : `; about ${formatNumber(idealRateNmm, 1)} N/mm would`;
  switch (verdict) {
    case 'keep':
      return adjustment ? `Keep the ${rate} and ${adjustment}.` : `Keep the ${rate}.`;
    case 'too-soft':
      return `The ${rate} is too soft: no preload puts both sags in their windows${ideal}.`;
    case 'too-stiff':
      return `The ${rate} is too stiff: no preload puts both sags in their windows${ideal}.`;
    case 'preload-out-of-range': {
      const needed = neededPreloadMm === null ? 'a preload' : `${formatNumber(neededPreloadMm, 1)} mm of preload`;
      return `The ${rate} suits, but it needs ${needed}, outside the adjuster's ${formatNumber(rangeMm.min, 1)} to ${formatNumber(rangeMm.max, 1)} mm.`;
    }
    default:
      return 'No verdict: the targets for this end cannot be met as set; check the target profile.';
  }
}
