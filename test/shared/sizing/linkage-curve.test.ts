import * as fc from 'fast-check';
import {
  buildLinkageCurve,
  curvatureAt,
  isRegressive,
  shockAt,
  slopeAt,
} from '@shared/sizing/linkage-curve';
import { sizeBike } from '@shared/sizing';
import { makeShockModel } from '@shared/sizing/shock';
import { makeSpringLaw } from '@shared/sizing/spring-law';
import type { LinkagePoint, RearRequest } from '@shared/types/sizing';
import { arbitraryLinkage, makeContext, roadRear, roadRequest } from './fixtures';

/**
 * An independent PCHIP written straight from SciPy's documentation of PchipInterpolator:
 * interior slopes by the weighted harmonic mean (w1 = 2h_k + h_(k-1), w2 = h_k + 2h_(k-1)), zero
 * where neighbouring secants differ in sign; end slopes by the one-sided three-point formula,
 * kept shape-preserving; then evaluated as CubicHermiteSpline does, in the power basis
 * c0 + c1*s + c2*s^2 + c3*s^3 with s = y - y_k.
 */
function scipyPchip(points: LinkagePoint[]) {
  const y = points.map((p) => p[0]);
  const x = points.map((p) => p[1]);
  const n = y.length;
  const h = y.slice(1).map((v, k) => v - y[k]);
  const m = h.map((hk, k) => (x[k + 1] - x[k]) / hk);
  const d = new Array<number>(n).fill(0);
  if (n === 2) {
    d[0] = d[1] = m[0];
  } else {
    for (let k = 1; k < n - 1; k++) {
      if (m[k - 1] * m[k] > 0) {
        const w1 = 2 * h[k] + h[k - 1];
        const w2 = h[k] + 2 * h[k - 1];
        d[k] = (w1 + w2) / (w1 / m[k - 1] + w2 / m[k]);
      }
    }
    const edge = (h0: number, h1: number, m0: number, m1: number) => {
      let e = ((2 * h0 + h1) * m0 - h0 * m1) / (h0 + h1);
      if (Math.sign(e) !== Math.sign(m0)) e = 0;
      else if (Math.sign(m0) !== Math.sign(m1) && Math.abs(e) > Math.abs(3 * m0)) e = 3 * m0;
      return e;
    };
    d[0] = edge(h[0], h[1], m[0], m[1]);
    d[n - 1] = edge(h[n - 2], h[n - 3], m[n - 2], m[n - 3]);
  }
  const coefficients = h.map((hk, k) => [x[k], d[k], (3 * m[k] - 2 * d[k] - d[k + 1]) / hk, (d[k] + d[k + 1] - 2 * m[k]) / (hk * hk)]);
  const locate = (v: number) => {
    let k = 0;
    while (k < n - 2 && v >= y[k + 1]) k++;
    return k;
  };
  return {
    slopes: d,
    value(v: number) {
      const k = locate(v);
      const s = v - y[k];
      const [c0, c1, c2, c3] = coefficients[k];
      return c0 + s * (c1 + s * (c2 + s * c3));
    },
    slope(v: number) {
      const k = locate(v);
      const s = v - y[k];
      const [, c1, c2, c3] = coefficients[k];
      return c1 + s * (2 * c2 + 3 * s * c3);
    },
    curvature(v: number) {
      const k = locate(v);
      const s = v - y[k];
      const [, , c2, c3] = coefficients[k];
      return 2 * c2 + 6 * s * c3;
    },
  };
}

/** First y where k*(p + x(y))*x'(y) reaches W: a fine scan, then bisection in the first bracket. */
function firstEquilibrium(curve: ReturnType<typeof scipyPchip>, travel: number, k: number, p: number, w: number) {
  const g = (y: number) => k * (p + curve.value(y)) * curve.slope(y);
  if (g(0) >= w) return 0;
  const steps = 20000;
  for (let i = 1; i <= steps; i++) {
    let hi = (travel * i) / steps;
    if (g(hi) >= w) {
      let lo = (travel * (i - 1)) / steps;
      for (let j = 0; j < 100; j++) {
        const mid = (lo + hi) / 2;
        if (g(mid) >= w) hi = mid;
        else lo = mid;
      }
      return (lo + hi) / 2;
    }
  }
  return null;
}

function rearWith(linkage: LinkagePoint[], overrides: Partial<RearRequest> = {}): RearRequest {
  const last = linkage[linkage.length - 1];
  return roadRear({ wheelTravelMm: last[0], shockStrokeMm: last[1], linkage, gasForceN: 0, ...overrides });
}

const PROGRESSIVE: LinkagePoint[] = [
  [0, 0],
  [40, 16],
  [80, 34],
  [120, 54],
];

describe('linkage curve: PCHIP with Fritsch-Butland slopes', () => {
  it('matches a hand-computed table', () => {
    // h = 40 throughout; secants delta = 16/40, 18/40, 20/40 = 0.4, 0.45, 0.5.
    // Interior (equal h, so w1 = w2): d1 = 2*0.4*0.45/(0.4+0.45) = 0.36/0.85 = 0.42352941,
    //   d2 = 2*0.45*0.5/0.95 = 0.45/0.95 = 0.47368421.
    // Ends: d0 = ((2*40+40)*0.4 - 40*0.45)/80 = (48-18)/80 = 0.375; d3 = (120*0.5 - 40*0.45)/80 = 0.525.
    const curve = buildLinkageCurve(PROGRESSIVE);
    const expectedSlopes = [0.375, 0.36 / 0.85, 0.45 / 0.95, 0.525];
    expectedSlopes.forEach((d, i) => expect(curve.slope[i]).toBeCloseTo(d, 12));
    // Midpoint of a segment (t = 1/2): x = (x0 + x1)/2 + h*(d0 - d1)/8, x' = 1.5*delta - (d0 + d1)/4.
    // Segment 0: 8 + 40*(0.375 - 0.4235294)/8 = 8 - 0.2426471 = 7.7573529;  x' = 0.6 - 0.1996324 = 0.4003676.
    // Segment 1: 25 + 5*(0.4235294 - 0.4736842) = 24.7492260;                x' = 0.675 - 0.2243034 = 0.4506966.
    // Segment 2: 44 + 5*(0.4736842 - 0.525) = 43.7434211;                    x' = 0.75 - 0.2496711 = 0.5003289.
    const table = [
      [20, 7.7573529, 0.4003676],
      [60, 24.749226, 0.4506966],
      [100, 43.7434211, 0.5003289],
    ];
    for (const [y, x, slope] of table) {
      expect(shockAt(curve, y)).toBeCloseTo(x, 6);
      expect(slopeAt(curve, y)).toBeCloseTo(slope, 6);
    }
    // Knots are reproduced exactly.
    PROGRESSIVE.forEach(([y, x]) => expect(shockAt(curve, y)).toBeCloseTo(x, 12));
  });

  it('agrees with the independent SciPy-style implementation everywhere', () => {
    const curves: LinkagePoint[][] = [
      PROGRESSIVE,
      [
        [0, 0],
        [10, 5],
        [35, 13],
        [60, 19],
        [95, 33],
        [130, 55],
      ],
      [
        [0, 0],
        [130, 48],
      ],
    ];
    for (const points of curves) {
      const ours = buildLinkageCurve(points);
      const theirs = scipyPchip(points);
      theirs.slopes.forEach((d, i) => expect(ours.slope[i]).toBeCloseTo(d, 12));
      const travel = points[points.length - 1][0];
      for (let i = 0; i <= 1000; i++) {
        const y = (travel * i) / 1000;
        expect(shockAt(ours, y)).toBeCloseTo(theirs.value(y), 10);
        expect(slopeAt(ours, y)).toBeCloseTo(theirs.slope(y), 10);
        expect(curvatureAt(ours, y)).toBeCloseTo(theirs.curvature(y), 10);
      }
    }
  });

  it('finds the sag of a worked progressive example as the independent solver does', () => {
    // k = 50 N/mm, p = 5 mm, W = 1000 N. By hand at the knots, G(y) = k*(p + x)*x':
    // G(80) = 50*(5 + 34)*0.4736842 = 923.68 N < 1000, G(120) = 50*(5 + 54)*0.525 = 1548.75 N > 1000,
    // so the sag lies between 80 and 120 mm.
    const model = makeShockModel(rearWith(PROGRESSIVE));
    const sag = model.sagAtLoad(makeSpringLaw(50), 5, 1000) as number;
    expect(sag).toBeGreaterThan(80);
    expect(sag).toBeLessThan(120);
    expect(sag).toBeCloseTo(firstEquilibrium(scipyPchip(PROGRESSIVE), 120, 50, 5, 1000) as number, 8);
    expect(model.loadAtSag(makeSpringLaw(50), 5, sag)).toBeCloseTo(1000, 8);
    expect(isRegressive(buildLinkageCurve(PROGRESSIVE))).toBe(false);
  });

  it('with collinear points reduces exactly to the constant leverage ratio', () => {
    // Every point on x = y / 2.5: LR = 125 / 50 = 2.5.
    const collinear: LinkagePoint[] = [
      [0, 0],
      [30, 12],
      [70, 28],
      [125, 50],
    ];
    const linked = makeShockModel(rearWith(collinear, { gasForceN: 200 }));
    const constant = makeShockModel(roadRear({ wheelTravelMm: 125, shockStrokeMm: 50, gasForceN: 200 }));
    const spring = makeSpringLaw(95);
    for (const [preload, load] of [
      [8, 900],
      [3, 1400],
      [12, 600],
    ]) {
      expect(linked.sagAtLoad(spring, preload, load)).toBeCloseTo(constant.sagAtLoad(spring, preload, load) as number, 9);
      expect(linked.preloadForSag(spring, load, 35)).toBeCloseTo(constant.preloadForSag(spring, load, 35) as number, 9);
      expect(linked.loadAtSag(spring, preload, 40)).toBeCloseTo(constant.loadAtSag(spring, preload, 40), 9);
    }
    expect(linked.wheelRateAt(spring, 8, 40)).toBeCloseTo(95 / 6.25, 9); // k / LR^2 = 95 / 2.5^2 = 15.2 N/mm
    const fitLinked = linked.fitSingleRate(10, 456, 40, 912);
    const fitConstant = constant.fitSingleRate(10, 456, 40, 912);
    expect(fitLinked?.rateNmm).toBeCloseTo(fitConstant?.rateNmm as number, 9);
    expect(fitLinked?.preloadMm).toBeCloseTo(fitConstant?.preloadMm as number, 9);
    expect(isRegressive(buildLinkageCurve(collinear))).toBe(false);
  });

  it('for any increasing curve, sag lies between the sags for its smallest and largest slope as a constant ratio', () => {
    const convexLinkage = (travel: number, stroke: number) =>
      arbitraryLinkage(travel, stroke).map((points) => {
        // Re-order the secants from shallow to steep: a convex (progressive) curve.
        const segments = points.slice(1).map((p, i) => [p[0] - points[i][0], p[1] - points[i][1]]);
        segments.sort((a, b) => a[1] / a[0] - b[1] / b[0]);
        const out: LinkagePoint[] = [[0, 0]];
        for (const [dy, dx] of segments) out.push([out[out.length - 1][0] + dy, out[out.length - 1][1] + dx]);
        out[out.length - 1] = [travel, stroke];
        return out;
      });
    const scenario = fc
      .record({
        travel: fc.double({ min: 90, max: 300, noNaN: true }),
        ratio: fc.double({ min: 1.5, max: 3.5, noNaN: true }),
        convex: fc.boolean(),
      })
      .chain(({ travel, ratio, convex }) =>
        fc.record({
          travel: fc.constant(travel),
          points: convex ? convexLinkage(travel, travel / ratio) : arbitraryLinkage(travel, travel / ratio),
          rate: fc.double({ min: 30, max: 200, noNaN: true }),
          preload: fc.double({ min: 0, max: 15, noNaN: true }),
          loadShare: fc.double({ min: 0, max: 1, noNaN: true }),
        }),
      );
    fc.assert(
      fc.property(scenario, ({ travel, points, rate, preload, loadShare }) => {
        const reference = scipyPchip(points);
        let cMin = Infinity;
        let cMax = -Infinity;
        for (let i = 0; i <= 4000; i++) {
          const s = reference.slope((travel * i) / 4000);
          cMin = Math.min(cMin, s);
          cMax = Math.max(cMax, s);
        }
        fc.pre(cMin > 0);
        // With a constant slope c: k*(p + c*y)*c = W, so y = (W/(k*c) - p)/c, clamped at 0.
        const constantSag = (c: number, w: number) => Math.max(0, (w / (rate * c) - preload) / c);
        // Keep W within reach of the softest constant ratio over the travel, so neither bound bottoms.
        const w = rate * (preload + cMin * travel) * cMin * (0.05 + 0.9 * loadShare);
        const sag = makeShockModel(rearWith(points)).sagAtLoad(makeSpringLaw(rate), preload, w);
        expect(sag).not.toBeNull();
        // Covers the slope extremes being sampled rather than solved for.
        const tolerance = 1e-6 * travel;
        expect(sag as number).toBeGreaterThanOrEqual(constantSag(cMax, w) - tolerance);
        expect(sag as number).toBeLessThanOrEqual(constantSag(cMin, w) + tolerance);
      }),
      { numRuns: 300 },
    );
  });

  it('when the slope falls, finds the first equilibrium from full extension, not a later one', () => {
    // Steep, then flat, then steep again: G(y) = k*(p + x)*x' rises past W, dips below it, rises again.
    const falling: LinkagePoint[] = [
      [0, 0],
      [20, 16],
      [40, 22],
      [60, 26],
      [80, 38],
      [100, 56],
    ];
    const k = 60;
    const p = 0;
    const w = 6 * k; // 360 N
    const reference = scipyPchip(falling);
    const g = (y: number) => k * (p + reference.value(y)) * reference.slope(y);
    const model = makeShockModel(rearWith(falling));
    const sag = model.sagAtLoad(makeSpringLaw(k), p, w) as number;
    expect(g(sag)).toBeCloseTo(w, 6);
    // Nothing earlier reaches W ...
    for (let y = 0; y < sag - 1e-6; y += sag / 2000) expect(g(y)).toBeLessThan(w);
    // ... though G falls back below W later and crosses it again.
    const later = [50, 55].map(g);
    expect(Math.min(...later)).toBeLessThan(w);
    expect(g(100)).toBeGreaterThan(w);
    // A bisection over the whole travel would have landed on that later root instead.
    let lo = 0;
    let hi = 100;
    for (let i = 0; i < 100; i++) {
      const mid = (lo + hi) / 2;
      if (g(mid) >= w) hi = mid;
      else lo = mid;
    }
    expect(Math.abs(lo - sag)).toBeGreaterThan(10);
    expect(sag).toBeCloseTo(firstEquilibrium(reference, 100, k, p, w) as number, 6);
    expect(isRegressive(buildLinkageCurve(falling))).toBe(true);
  });

  it('reports topped out (0) and bottomed out (null) instead of a number', () => {
    const model = makeShockModel(rearWith(PROGRESSIVE));
    // k*p*x'(0) = 50 * 20 * 0.375 = 375 N >= 300 N: the preload holds it fully extended.
    expect(model.sagAtLoad(makeSpringLaw(50), 20, 300)).toBe(0);
    // G(120) = 50*(5 + 54)*0.525 = 1548.75 N < 2000 N: it would bottom.
    expect(model.sagAtLoad(makeSpringLaw(50), 5, 2000)).toBeNull();
  });

  it('judges regression on the measured secants, not on the interpolant', () => {
    // Secants 8.75/25 = 0.35, 0.35, 11/25 = 0.44, 12.5/25 = 0.5, 0.5: they never fall, though the
    // PCHIP slope dips to 0.339 near 30 mm (the interpolant keeps x monotone, not x').
    const steady: LinkagePoint[] = [
      [0, 0],
      [25, 8.75],
      [50, 17.5],
      [75, 28.5],
      [100, 41],
      [125, 53.5],
    ];
    const curve = buildLinkageCurve(steady);
    expect(slopeAt(curve, 30)).toBeLessThan(0.345);
    expect(isRegressive(curve)).toBe(false);
    // A secant 0.5 % below the steepest before it is typing noise; 2 % below it is a dip.
    const after = (second: number): LinkagePoint[] => [
      [0, 0],
      [25, 10],
      [50, 10 + 25 * second],
      [75, 20 + 25 * second],
    ];
    expect(isRegressive(buildLinkageCurve(after(0.4 * 0.995)))).toBe(false);
    expect(isRegressive(buildLinkageCurve(after(0.4 * 0.98)))).toBe(true);
  });

  describe('where G(y) falls back below W (a regressive curve)', () => {
    const regressive: LinkagePoint[] = [
      [0, 0],
      [20, 12],
      [40, 18],
      [60, 22],
      [80, 28],
      [100, 38],
      [125, 50],
    ];
    // Road rear load of the fixtures' bike: (110 - 25) g + 88*0.65 g = 142.2 g = 1394.50563 N.
    const loadN = 142.2 * 9.80665;

    it('gives no preload for a sag the end would not come to rest at', () => {
      const model = makeShockModel(rearWith(regressive));
      const spring = makeSpringLaw(120);
      // Solving G(38.125) = W directly: p = W/x'(38.125) - x(38.125) = 29.9 mm. With that preload,
      // k*p*x'(0) = 120 * 29.9 * 0.75 = 2693 N >= W: the end stays topped out, never reaching 38 mm.
      const slope0 = slopeAt(buildLinkageCurve(regressive), 0);
      const direct = loadN / (120 * slopeAt(buildLinkageCurve(regressive), 38.125)) - shockAt(buildLinkageCurve(regressive), 38.125);
      expect(120 * direct * slope0).toBeGreaterThan(loadN);
      expect(model.sagAtLoad(spring, direct, loadN)).toBe(0);
      expect(model.preloadForSag(spring, loadN, 38.125)).toBeNull();
      // Past the dip the sag is a first equilibrium, and the preload for it round-trips.
      const deep = model.preloadForSag(spring, loadN, 75) as number;
      expect(deep).not.toBeNull();
      expect(model.sagAtLoad(spring, deep, loadN)).toBeCloseTo(75, 9);
    });

    it('lists no catalogue spring as feasible at a preload that leaves the bike topped out', () => {
      const rear = roadRear({ linkage: regressive, adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 40 } });
      const result = sizeBike(roadRequest({ front: undefined, rear }), makeContext()).rear!;
      expect(result.recommendation.best).toBeNull();
      // Each is judged at the best setting the adjuster can make, and none puts rider sag in its window.
      for (const candidate of result.recommendation.candidates) {
        expect(candidate.feasible).toBe(false);
        expect(candidate.reason).toMatch(/^At its best setting: Rider sag [\d.]+ mm \(window 35 to 41.3 mm\)/);
      }
      // Nor does the verdict keep the installed spring: no preload holds rider sag in its window.
      expect(result.verdict).not.toBe('keep');
      expect(result.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['regressive-linkage', 'window-unreachable']));
    });

  });

  it('reports for every candidate the sags that its rounded setting gives', () => {
    // Each reported sag is the model's first equilibrium at the preload that will be set, not the target.
    const rear = rearWith(PROGRESSIVE, { adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 40 } });
    const model = makeShockModel(rear);
    const result = sizeBike(roadRequest({ front: undefined, rear }), makeContext()).rear!;
    const { staticN, riderN } = result.loads;
    const set = result.recommendation.candidates.filter((c) => c.setPreloadMm !== null);
    expect(set.length).toBeGreaterThan(0);
    for (const c of set) {
      const spring = makeSpringLaw(c.rateNmm);
      expect(c.riderSagMm).toBeCloseTo(model.sagAtLoad(spring, c.setPreloadMm as number, staticN + riderN) as number, 9);
      expect(c.staticSagMm).toBeCloseTo(model.sagAtLoad(spring, c.setPreloadMm as number, staticN) as number, 9);
    }
    expect(set.some((c) => Math.abs((c.riderSagMm as number) - result.target.riderMiddleMm) > 1e-3)).toBe(true);
  });
});
