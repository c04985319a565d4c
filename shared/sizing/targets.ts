/**
 * Sag windows for one end from the discipline's profile (% of travel). An explicit request target
 * moves the middles; the widths stay the profile's.
 */

import type { EndTarget, EndWindowsPct, RangeMm, Window } from '../types/sizing';

export interface SagWindows {
  source: 'profile' | 'request';
  riderSagMm: RangeMm;
  staticSagMm: RangeMm;
  riderMiddleMm: number;
  staticMiddleMm: number;
}

function windowMm(pct: Window, travelMm: number): RangeMm {
  return { min: (pct[0] / 100) * travelMm, max: (pct[1] / 100) * travelMm };
}

function centreOn(window: RangeMm, middleMm: number, travelMm: number): RangeMm {
  const half = (window.max - window.min) / 2;
  return { min: Math.max(0, middleMm - half), max: Math.min(travelMm, middleMm + half) };
}

export function resolveSagWindows(
  profile: EndWindowsPct,
  travelMm: number,
  explicit?: EndTarget,
): SagWindows {
  const rider = windowMm(profile.riderSagPct, travelMm);
  const stat = windowMm(profile.staticSagPct, travelMm);
  if (!explicit) {
    return {
      source: 'profile',
      riderSagMm: rider,
      staticSagMm: stat,
      riderMiddleMm: (rider.min + rider.max) / 2,
      staticMiddleMm: (stat.min + stat.max) / 2,
    };
  }
  return {
    source: 'request',
    riderSagMm: centreOn(rider, explicit.riderSagMm, travelMm),
    staticSagMm: centreOn(stat, explicit.staticSagMm, travelMm),
    riderMiddleMm: explicit.riderSagMm,
    staticMiddleMm: explicit.staticSagMm,
  };
}

/** Windows the engine can aim at: ordered, and the rider middle above the static one. */
export function areWindowsUsable(windows: SagWindows): boolean {
  return (
    windows.riderSagMm.min <= windows.riderSagMm.max &&
    windows.staticSagMm.min <= windows.staticSagMm.max &&
    windows.riderMiddleMm > windows.staticMiddleMm &&
    windows.riderMiddleMm > 0
  );
}

/** Allowance for the float noise of a sag computed back from a preload aimed at a window's edge. */
const WINDOW_EDGE_MM = 1e-6;

/** Window edges count as inside; a bottomed-out sag (null) never does. */
export function isInsideWindow(sagMm: number | null, window: RangeMm): boolean {
  return sagMm !== null && sagMm >= window.min - WINDOW_EDGE_MM && sagMm <= window.max + WINDOW_EDGE_MM;
}

export function toPercent(mm: number, travelMm: number): number {
  return (mm / travelMm) * 100;
}
