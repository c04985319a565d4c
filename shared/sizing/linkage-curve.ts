/**
 * Shock compression x against wheel travel y from measured points, interpolated with a monotone
 * piecewise cubic Hermite curve whose knot slopes are Fritsch-Butland weighted harmonic means
 * (Fritsch and Butland 1984; the method of SciPy's PchipInterpolator and MATLAB's pchip), so x'(y)
 * is continuous and sag does not snap to the points.
 */

import { findRoot } from './find-root';

export interface LinkageCurve {
  /** Wheel travel at the knots (mm), strictly increasing from 0. */
  wheelMm: Float64Array;
  /** Shock compression at the knots (mm). */
  shockMm: Float64Array;
  /** dx/dy at the knots. */
  slope: Float64Array;
}

/** Steps per segment in the walk for the first equilibrium: fine enough that a crossing is not stepped over. */
const WALK_STEPS_PER_SEGMENT = 16;

export function buildLinkageCurve(points: readonly (readonly [number, number])[]): LinkageCurve {
  const n = points.length;
  const wheelMm = new Float64Array(n);
  const shockMm = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    wheelMm[i] = points[i][0];
    shockMm[i] = points[i][1];
  }
  return { wheelMm, shockMm, slope: computeKnotSlopes(wheelMm, shockMm) };
}

function computeKnotSlopes(y: Float64Array, x: Float64Array): Float64Array {
  const n = y.length;
  const d = new Float64Array(n);
  if (n === 2) {
    d[0] = d[1] = (x[1] - x[0]) / (y[1] - y[0]);
    return d;
  }
  const h = new Float64Array(n - 1);
  const delta = new Float64Array(n - 1);
  for (let k = 0; k < n - 1; k++) {
    h[k] = y[k + 1] - y[k];
    delta[k] = (x[k + 1] - x[k]) / h[k];
  }
  for (let k = 1; k < n - 1; k++) {
    const before = delta[k - 1];
    const after = delta[k];
    if (before === 0 || after === 0 || before > 0 !== after > 0) {
      d[k] = 0;
    } else {
      const w1 = 2 * h[k] + h[k - 1];
      const w2 = h[k] + 2 * h[k - 1];
      d[k] = (w1 + w2) / (w1 / before + w2 / after);
    }
  }
  d[0] = edgeSlope(h[0], h[1], delta[0], delta[1]);
  d[n - 1] = edgeSlope(h[n - 2], h[n - 3], delta[n - 2], delta[n - 3]);
  return d;
}

/** SciPy's one-sided three-point end slope, kept shape-preserving. */
function edgeSlope(h0: number, h1: number, m0: number, m1: number): number {
  const d = ((2 * h0 + h1) * m0 - h0 * m1) / (h0 + h1);
  if (Math.sign(d) !== Math.sign(m0)) return 0;
  if (Math.sign(m0) !== Math.sign(m1) && Math.abs(d) > Math.abs(3 * m0)) return 3 * m0;
  return d;
}

function findSegment(curve: LinkageCurve, wheelMm: number): number {
  const y = curve.wheelMm;
  let lo = 0;
  let hi = y.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (y[mid] <= wheelMm) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Shock compression at a wheel travel (mm). */
export function shockAt(curve: LinkageCurve, wheelMm: number): number {
  const k = findSegment(curve, wheelMm);
  const h = curve.wheelMm[k + 1] - curve.wheelMm[k];
  const t = (wheelMm - curve.wheelMm[k]) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * curve.shockMm[k] +
    (t3 - 2 * t2 + t) * h * curve.slope[k] +
    (-2 * t3 + 3 * t2) * curve.shockMm[k + 1] +
    (t3 - t2) * h * curve.slope[k + 1]
  );
}

/** dx/dy, the inverse of the leverage ratio at that point. */
export function slopeAt(curve: LinkageCurve, wheelMm: number): number {
  const k = findSegment(curve, wheelMm);
  const h = curve.wheelMm[k + 1] - curve.wheelMm[k];
  const t = (wheelMm - curve.wheelMm[k]) / h;
  const t2 = t * t;
  return (
    ((6 * t2 - 6 * t) * (curve.shockMm[k] - curve.shockMm[k + 1])) / h +
    (3 * t2 - 4 * t + 1) * curve.slope[k] +
    (3 * t2 - 2 * t) * curve.slope[k + 1]
  );
}

/** d2x/dy2 (per mm). */
export function curvatureAt(curve: LinkageCurve, wheelMm: number): number {
  const k = findSegment(curve, wheelMm);
  const h = curve.wheelMm[k + 1] - curve.wheelMm[k];
  const t = (wheelMm - curve.wheelMm[k]) / h;
  return (
    ((12 * t - 6) * (curve.shockMm[k] - curve.shockMm[k + 1])) / (h * h) +
    ((6 * t - 4) * curve.slope[k] + (6 * t - 2) * curve.slope[k + 1]) / h
  );
}

/**
 * How far (relative) a secant may fall below the steepest before it and still count as level:
 * points typed to a tenth of a millimetre on 25 mm steps move a secant by about 1 %; a real dip or
 * a misread point moves it by more.
 */
const REGRESSIVE_TOLERANCE = 0.01;

/**
 * True when the measured points get less steep somewhere: a regressive linkage or a mis-measured
 * point. The points are judged, not the interpolant, whose slope can sag a little between points
 * that are progressive (PCHIP keeps x monotone, not x').
 */
export function isRegressive(curve: LinkageCurve): boolean {
  const y = curve.wheelMm;
  const x = curve.shockMm;
  let steepest = -Infinity;
  for (let k = 0; k < y.length - 1; k++) {
    const secant = (x[k + 1] - x[k]) / (y[k + 1] - y[k]);
    if (secant < steepest * (1 - REGRESSIVE_TOLERANCE)) return true;
    steepest = Math.max(steepest, secant);
  }
  return false;
}

/**
 * First wheel travel from full extension where the rising wheel load G(y) reaches W: walk up in
 * small steps, then refine inside the step. Never a bracket over the whole travel, which can land
 * on a later root when x' falls. Returns 0 when the end stays topped out and null when it bottoms.
 */
export function findFirstEquilibrium(
  curve: LinkageCurve,
  wheelLoadAt: (wheelMm: number) => number,
  loadN: number,
): number | null {
  if (wheelLoadAt(0) >= loadN) return 0;
  const y = curve.wheelMm;
  let previous = 0;
  for (let k = 0; k < y.length - 1; k++) {
    const step = (y[k + 1] - y[k]) / WALK_STEPS_PER_SEGMENT;
    for (let i = 1; i <= WALK_STEPS_PER_SEGMENT; i++) {
      const at = i === WALK_STEPS_PER_SEGMENT ? y[k + 1] : y[k] + i * step;
      if (wheelLoadAt(at) >= loadN) {
        return findRoot((w) => wheelLoadAt(w) - loadN, previous, at);
      }
      previous = at;
    }
  }
  return null;
}
