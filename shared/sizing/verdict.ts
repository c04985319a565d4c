/**
 * Verdict with the installed spring (section 5c): can some preload put both sags inside their
 * windows, and inside the adjuster's range? Aim rider sag at the middle of its window unless that
 * pushes static sag out, then at the nearest rider sag that keeps both in.
 */

import type { LoadsN, RangeMm, Verdict } from '../types/sizing';
import type { EndModel } from './end-model';
import { findRoot } from './find-root';
import { formatNumber } from './format';
import type { SpringLaw } from './spring-law';
import type { SagWindows } from './targets';

export interface PreloadAim {
  verdict: Verdict;
  aimRiderSagMm: number;
  neededPreloadMm: number | null;
}

export function aimPreload(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  rangeMm: RangeMm,
): PreloadAim {
  const totalN = loads.staticN + loads.riderN;
  // Static sag once preload puts rider sag at r: non-decreasing in r, as less preload lets both sink.
  const staticFor = (riderSagMm: number): number => {
    const preload = model.preloadForSag(spring, totalN, riderSagMm);
    if (preload === null) return riderSagMm;
    return model.sagAtLoad(spring, preload, loads.staticN) ?? model.travelMm;
  };
  const { min: lo, max: hi } = windows.riderSagMm;
  const { min: tMin, max: tMax } = windows.staticSagMm;
  const middle = windows.riderMiddleMm;
  const finish = (verdict: Verdict, aimRiderSagMm: number): PreloadAim => ({
    verdict,
    aimRiderSagMm,
    neededPreloadMm: model.preloadForSag(spring, totalN, aimRiderSagMm),
  });

  const staticAtLo = staticFor(lo);
  const staticAtHi = staticFor(hi);
  if (staticAtLo > tMax) return finish('too-stiff', middle);
  if (staticAtHi < tMin) return finish('too-soft', middle);

  const fromWindow = staticAtLo >= tMin ? lo : findRoot((r) => staticFor(r) - tMin, lo, hi);
  const toWindow = staticAtHi <= tMax ? hi : findRoot((r) => staticFor(r) - tMax, lo, hi);
  // More preload, less rider sag: the adjuster's ends bound the rider sag it can give.
  const fromAdjuster = model.sagAtLoad(spring, rangeMm.max, totalN) ?? model.travelMm;
  const toAdjuster = model.sagAtLoad(spring, rangeMm.min, totalN) ?? model.travelMm;
  const from = Math.max(fromWindow, fromAdjuster);
  const to = Math.min(toWindow, toAdjuster);
  if (rangeMm.min <= rangeMm.max && from <= to) return finish('keep', clamp(middle, from, to));
  return finish('preload-out-of-range', clamp(middle, fromWindow, toWindow));
}

function clamp(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
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
