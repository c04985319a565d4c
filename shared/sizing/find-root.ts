/**
 * Brent's method (Numerical Recipes' zbrent) for a root of f bracketed by [a, b].
 * Used where a sag has no closed form: a linkage curve, or a window edge of a dual-rate spring.
 */

const EPSILON = 2.220446049250313e-16;

export function findRoot(
  f: (x: number) => number,
  lower: number,
  upper: number,
  toleranceMm = 1e-12,
  maxIterations = 200,
): number {
  let a = lower;
  let b = upper;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  let c = b;
  let fc = fb;
  let d = b - a;
  let e = d;
  for (let i = 0; i < maxIterations; i++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPSILON * Math.abs(b) + 0.5 * toleranceMm;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * half * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * half * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      p = Math.abs(p);
      if (2 * p < Math.min(3 * half * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = half;
        e = d;
      }
    } else {
      d = half;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : half > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}
