/**
 * Every seeded row that claims a step-response effect, checked against m*x'' + c*x' + k*x = input
 * integrated with the odex ODE solver (Hairer's ODEX). The linear model has one damping
 * coefficient for both strokes, so a rebound or a compression change moves the same c: what is
 * checked is the direction of each row against its claim, never the size of a click.
 *
 * Each claim names a quantity that should fall; the ODE, not this file, says which way zeta must
 * move for it to fall. A row passes when moving zeta its way lowers the quantity, and its flipped
 * copy (the same row turned the other way) must then fail: a row whose direction contradicted its
 * claim fails here.
 *
 * Base damping ratios 0.25 and 0.4: motorcycle ride damping ratios are about 0.2-0.5 (from memory,
 * as in the sizing notes, section 5i). Natural frequency 12 rad/s (about 1.9 Hz), a road bike's
 * ride frequency (from memory).
 */
import { SEEDED_DAMPING_RULES } from '@shared/damping';
import { computeOvershoot } from '@shared/sizing';
import type { DampingClaim, DampingDirection } from '@shared/types/damping';

// odex ships TypeScript sources rather than declarations; only what these tests use.
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  denseOutput: boolean;
  solve(f: (t: number, y: number[]) => number[], t0: number, y0: number[], tEnd: number, out: unknown): { y: number[] };
  grid(dt: number, out: (t: number, y: number[]) => void): unknown;
}
// eslint-disable-next-line @typescript-eslint/no-require-imports -- odex has no declarations to import with
const { Solver } = require('odex') as { Solver: new (n: number) => OdexSolver };

const WN = 12;
const BASE_ZETAS = [0.25, 0.4];
/** How far a row moves zeta in the check: a few clicks' worth on a typical damper, in either direction. */
const MOVE = 1.5;

interface Sample {
  t: number;
  x: number;
  v: number;
  a: number;
}

type Forcing = (t: number) => { y: number; yDot: number };

const FLAT: Forcing = () => ({ y: 0, yDot: 0 });

/**
 * Base-excited mass on spring and damper, per unit mass: x'' = -2*zeta*wn*(x' - y') - wn^2*(x - y)
 * (Rao, Mechanical Vibrations, ch. 3, from memory). A load step is the same with y = 1 from t = 0
 * and y' = 0: a force step whose static deflection is 1 (Ogata, Modern Control Engineering, ch. 5).
 */
function integrate(zeta: number, forcing: Forcing, from: number, to: number, start: [number, number], dt: number): { samples: Sample[]; end: [number, number] } {
  const solver = new Solver(2);
  solver.denseOutput = true;
  solver.absoluteTolerance = 1e-11;
  solver.relativeTolerance = 1e-11;
  const accel = (t: number, x: number, v: number) => {
    const { y, yDot } = forcing(t);
    return -2 * zeta * WN * (v - yDot) - WN * WN * (x - y);
  };
  const samples: Sample[] = [];
  const result = solver.solve(
    (t, [x, v]) => [v, accel(t, x, v)],
    from,
    start,
    to,
    solver.grid(dt, (t, [x, v]) => {
      samples.push({ t, x, v, a: accel(t, x, v) });
    }),
  );
  return { samples, end: [result.y[0], result.y[1]] };
}

/** Load step (braking, a passenger getting on): overshoot past the new static position. */
function loadStep(zeta: number): Sample[] {
  return integrate(zeta, () => ({ y: 1, yDot: 0 }), 0, 2, [0, 0], 1e-4).samples;
}

/** Half-sine bump 20 ms long: a sharp edge, far shorter than the natural period 2*pi/12 = 524 ms. */
const BUMP_S = 0.02;

function sharpBump(zeta: number): Sample[] {
  const bump: Forcing = (t) => ({ y: Math.sin((Math.PI * t) / BUMP_S), yDot: (Math.PI / BUMP_S) * Math.cos((Math.PI * t) / BUMP_S) });
  // Two pieces, so the solver never steps across the kink where the bump ends.
  const over = integrate(zeta, bump, 0, BUMP_S, [0, 0], BUMP_S / 400);
  const after = integrate(zeta, FLAT, BUMP_S, 1, over.end, 1e-4);
  return [...over.samples, ...after.samples];
}

/** Released from a compressed position (1) with no input: how soon it is back. */
function release(zeta: number): Sample[] {
  return integrate(zeta, FLAT, 0, 2, [1, 0], 1e-4).samples;
}

/** The quantity each claim says falls. */
const MEASURE: Record<DampingClaim, (zeta: number) => number> = {
  // Ogata ch. 5: load-step overshoot; also checked against the closed form below.
  'less-overshoot': (zeta) => Math.max(...loadStep(zeta).map((s) => s.x)) - 1,
  // The dive's speed: peak velocity under a load step.
  'slower-dive': (zeta) => Math.max(...loadStep(zeta).map((s) => s.v)),
  // What the rider feels: peak acceleration of the sprung mass over and after the bump.
  'softer-on-sharp-bumps': (zeta) => Math.max(...sharpBump(zeta).map((s) => Math.abs(s.a))),
  // Time to recover 90 % of the released displacement, interpolated between samples.
  'faster-recovery': (zeta) => {
    const samples = release(zeta);
    const i = samples.findIndex((s) => s.x <= 0.1);
    const [p, q] = [samples[i - 1], samples[i]];
    return p.t + ((p.x - 0.1) / (p.x - q.x)) * (q.t - p.t);
  },
};

const memo = new Map<string, number>();

function measure(claim: DampingClaim, zeta: number): number {
  const key = `${claim}@${zeta}`;
  if (!memo.has(key)) memo.set(key, MEASURE[claim](zeta));
  return memo.get(key)!;
}

/** More damping raises zeta (zeta = c / (2*sqrt(k*m)), Rao ch. 2). */
function moved(zeta: number, direction: DampingDirection): number {
  return direction === 'more' ? zeta * MOVE : zeta / MOVE;
}

function claimHolds(claim: DampingClaim, direction: DampingDirection, zeta: number): boolean {
  return measure(claim, moved(zeta, direction)) < measure(claim, zeta);
}

const flip = (direction: DampingDirection): DampingDirection => (direction === 'more' ? 'less' : 'more');

const CLAIMED = SEEDED_DAMPING_RULES.filter((rule) => rule.claim !== null).map((rule) => [`${rule.symptom} ${rule.end} ${rule.adjuster} ${rule.direction}`, rule] as const);

describe('seeded rows against the ODE', () => {
  it('there are rows with each claim', () => {
    expect(new Set(CLAIMED.map(([, rule]) => rule.claim))).toEqual(new Set(['less-overshoot', 'slower-dive', 'softer-on-sharp-bumps', 'faster-recovery']));
  });

  it.each(CLAIMED)('%s: its claim holds, and not for the flipped copy', (_name, rule) => {
    const claim = rule.claim as DampingClaim;
    for (const zeta of BASE_ZETAS) {
      expect(claimHolds(claim, rule.direction, zeta)).toBe(true);
      expect(claimHolds(claim, flip(rule.direction), zeta)).toBe(false);
    }
  });
});

describe('the measures themselves', () => {
  it.each(BASE_ZETAS.flatMap((zeta) => [zeta, zeta * MOVE, zeta / MOVE]))('load-step overshoot from the ODE equals exp(-pi*zeta/sqrt(1-zeta^2)) at zeta %d (Ogata ch. 5)', (zeta) => {
    expect(measure('less-overshoot', zeta)).toBeCloseTo(computeOvershoot('load', zeta), 6);
  });

  it('load-step peak velocity equals wn*exp(-zeta*acos(zeta)/sqrt(1-zeta^2)) (derived from the step response of Ogata ch. 5)', () => {
    // x' = wn/sqrt(1-z^2) * e^(-z wn t) sin(wd t) peaks where tan(wd t) = sqrt(1-z^2)/z, i.e. wd t = acos(z).
    for (const zeta of BASE_ZETAS) {
      expect(measure('slower-dive', zeta)).toBeCloseTo(WN * Math.exp((-zeta * Math.acos(zeta)) / Math.sqrt(1 - zeta * zeta)), 3);
    }
  });

  it('above sqrt(2) times the natural frequency, transmissibility grows with zeta; below it, it falls (Rao ch. 3, from memory)', () => {
    const transmissibility = (r: number, zeta: number) => Math.sqrt((1 + (2 * zeta * r) ** 2) / ((1 - r * r) ** 2 + (2 * zeta * r) ** 2));
    expect(transmissibility(3, 0.4)).toBeGreaterThan(transmissibility(3, 0.25));
    expect(transmissibility(1, 0.4)).toBeLessThan(transmissibility(1, 0.25));
    expect(transmissibility(Math.SQRT2, 0.4)).toBeCloseTo(1, 12);
    // The bump's spectrum reaches its first zero at 3*pi/0.02 = 471 rad/s, mostly far above sqrt(2)*12 = 17 rad/s:
    // the pulse is a tenth of the natural period or less.
    expect(BUMP_S).toBeLessThan((2 * Math.PI) / WN / 10);
  });

  it('recovery of a released displacement: the free response reaches 0.1 sooner at lower zeta (Rao ch. 2, free damped vibration)', () => {
    // Closed form x = e^(-z wn t)(cos wd t + z/sqrt(1-z^2) sin wd t); the ODE's crossing must lie on it.
    for (const zeta of BASE_ZETAS) {
      const t = measure('faster-recovery', zeta);
      const wd = WN * Math.sqrt(1 - zeta * zeta);
      const x = Math.exp(-zeta * WN * t) * (Math.cos(wd * t) + (zeta / Math.sqrt(1 - zeta * zeta)) * Math.sin(wd * t));
      expect(x).toBeCloseTo(0.1, 5);
    }
  });
});
