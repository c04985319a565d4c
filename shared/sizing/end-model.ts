/**
 * What the engine needs to know about one end, whatever its geometry: the wheel load that holds a
 * spring at a sag, its inverse, and the vertical wheel rate. Sags are in the end's own measure:
 * axial mm at the fork, wheel mm at the shock.
 */

import type { EndKind } from '../types/sizing';
import type { SpringLaw } from './spring-law';

export interface SingleRateFit {
  rateNmm: number;
  preloadMm: number;
}

export interface EndModel {
  end: EndKind;
  travelMm: number;
  /** Spring compression over the full travel, for the coil-bind check. */
  springStrokeMm: number;
  springsPerEnd: number;
  /** The linkage curve's slope falls somewhere. */
  regressive: boolean;
  /** Sag moves with preload at a fixed ratio (a fork, or a shock with a constant leverage ratio): no curve. */
  fixedRatio: boolean;
  /** Vertical wheel load (N) that holds the end at this sag. */
  loadAtSag(spring: SpringLaw, preloadMm: number, sagMm: number): number;
  /** 0 when topped out (the clamp acts), null when the load would bottom the end. */
  sagAtLoad(spring: SpringLaw, preloadMm: number, loadN: number): number | null;
  /**
   * Preload that holds the end at this sag under the load; null where the geometry gives none,
   * including where the end would come to rest short of it (a linkage whose x' falls).
   */
  preloadForSag(spring: SpringLaw, loadN: number, sagMm: number): number | null;
  /** Spring compression at this sag and preload. */
  springDeflectionAt(preloadMm: number, sagMm: number): number;
  /** Vertical wheel rate (N/mm) at this sag. */
  wheelRateAt(spring: SpringLaw, preloadMm: number, sagMm: number): number;
  /** The single-rate spring and preload that hold sag A under load A and sag B under load B. */
  fitSingleRate(sagAMm: number, loadAN: number, sagBMm: number, loadBN: number): SingleRateFit | null;
}

export function clampSag(sagMm: number, travelMm: number): number | null {
  if (sagMm <= 0) return 0;
  return sagMm > travelMm ? null : sagMm;
}

export function acceptFit(rateNmm: number, preloadMm: number): SingleRateFit | null {
  if (!(rateNmm > 0) || !Number.isFinite(rateNmm) || !Number.isFinite(preloadMm)) return null;
  return { rateNmm, preloadMm };
}
