import {
  computeOvershoot,
  computePeakTime,
  sampleStepResponse,
  stepResponseAt,
  type StepKind,
} from '@shared/sizing';

// odex ships TypeScript sources rather than declarations; only what these tests use.
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  denseOutput: boolean;
  solve(f: (t: number, y: number[]) => number[], t0: number, y0: number[], tEnd: number, out: unknown): unknown;
  grid(dt: number, out: (t: number, y: number[]) => void): unknown;
}
// eslint-disable-next-line @typescript-eslint/no-require-imports -- odex has no declarations to import with
const { Solver } = require('odex') as { Solver: new (n: number) => OdexSolver };

/**
 * m*x'' + c*x' + k*x = c*y' + k*y with m = 1, k = wn^2, c = 2*zeta*wn, integrated numerically.
 * Road step: y = 1 for t > 0, so y' is an impulse that makes x'(0+) = c/m. Load step: x'(0) = 0
 * and the same right-hand side k*1 (unit static deflection).
 */
function integrate(kind: StepKind, wn: number, zeta: number, tEnd: number, steps = 20000) {
  const solver = new Solver(2);
  solver.denseOutput = true;
  solver.absoluteTolerance = 1e-11;
  solver.relativeTolerance = 1e-11;
  const t: number[] = [];
  const x: number[] = [];
  const initialVelocity = kind === 'road' ? 2 * zeta * wn : 0;
  solver.solve(
    (_t, [pos, vel]) => [vel, -2 * zeta * wn * vel - wn * wn * (pos - 1)],
    0,
    [0, initialVelocity],
    tEnd,
    solver.grid(tEnd / steps, (time, [pos]) => {
      t.push(time);
      x.push(pos);
    }),
  );
  return { t, x };
}

function peakOf(curve: { t: number[]; x: number[] }) {
  let at = 0;
  for (let i = 1; i < curve.x.length; i++) if (curve.x[i] > curve.x[at]) at = i;
  return { overshoot: curve.x[at] - 1, time: curve.t[at] };
}

const WN = 12; // rad/s, about 1.9 Hz: a road bike's ride frequency (from memory)

describe('ride preview: closed forms of section 5i against odex', () => {
  const zetas = [0.3, 0.5, 0.707, 1, 2];
  it.each(zetas.flatMap((z) => [['road', z] as const, ['load', z] as const]))(
    '%s step at zeta %d follows the ODE solution',
    (kind, zeta) => {
      const tEnd = 3;
      const ode = integrate(kind, WN, zeta, tEnd);
      let worst = 0;
      for (let i = 0; i < ode.t.length; i += 50) {
        worst = Math.max(worst, Math.abs(stepResponseAt(kind, WN, zeta, ode.t[i]) - ode.x[i]));
      }
      expect(worst).toBeLessThan(1e-7);
    },
  );

  it.each([
    // Published: 45.1 % at 0.3 and 20.8 % at 0.707 for the road step (sizing spec 5i, from Ogata ch. 5 / Rao).
    ['road', 0.3, 0.451],
    ['road', 0.707, 0.208],
    // exp(-0.5*(pi - 2*asin 0.5)/sqrt(0.75)) = exp(-1.2092) = 0.2984, the closed form's own value.
    ['road', 0.5, 0.2984],
    // Published: 4.3 % at 0.707 (sizing spec 5i) and 16.3 % at 0.5 (Ogata ch. 5, from memory).
    ['load', 0.707, 0.043],
    ['load', 0.5, 0.163],
    // exp(-pi*0.3/sqrt(0.91)) = exp(-0.98799) = 0.3723.
    ['load', 0.3, 0.3723],
  ] as const)('%s-step overshoot at zeta %d is %d: formula, and the peak of the ODE solution', (kind, zeta, published) => {
    expect(computeOvershoot(kind, zeta)).toBeCloseTo(published, 3);
    const ode = integrate(kind, WN, zeta, 2);
    const peak = peakOf(ode);
    expect(peak.overshoot).toBeCloseTo(computeOvershoot(kind, zeta), 6);
    expect(Math.abs(peak.time - (computePeakTime(kind, WN, zeta) as number))).toBeLessThan(2 / 20000 + 1e-6);
  });

  it('peak times: road (pi - 2*asin(zeta))/wd, load pi/wd (Ogata ch. 5)', () => {
    const zeta = 0.3;
    const wd = WN * Math.sqrt(1 - zeta * zeta); // 12 * 0.953939 = 11.44727 rad/s
    expect(computePeakTime('road', WN, zeta)).toBeCloseTo((Math.PI - 2 * Math.asin(0.3)) / wd, 12); // 2.53221 / 11.44727 = 0.22121 s
    expect(computePeakTime('load', WN, zeta)).toBeCloseTo(Math.PI / wd, 12); // 0.27444 s
  });

  it('critically damped: the load step never overshoots; the road step overshoots by e^-2 at t = 2/wn', () => {
    // x_road = 1 - e^(-wn t)(1 - wn t): dx/dt = wn e^(-wn t)(2 - wn t) = 0 at wn t = 2, x = 1 + e^-2 = 1.1353.
    expect(computeOvershoot('road', 1)).toBeCloseTo(Math.exp(-2), 12);
    expect(computePeakTime('road', WN, 1)).toBeCloseTo(2 / WN, 12);
    expect(computeOvershoot('load', 1)).toBe(0);
    expect(computePeakTime('load', WN, 1)).toBeNull();
    const road = peakOf(integrate('road', WN, 1, 2));
    expect(road.overshoot).toBeCloseTo(Math.exp(-2), 6);
    const load = integrate('load', WN, 1, 2);
    expect(Math.max(...load.x)).toBeLessThanOrEqual(1 + 1e-9);
  });

  it('overdamped (zeta 2): the load step creeps up; the road step still overshoots, as the ODE shows', () => {
    // Mp = exp(-2*zeta*acosh(zeta)/sqrt(zeta^2-1)) = exp(-4 * 1.3169579 / 1.7320508) = exp(-3.0413840) = 0.047769.
    expect(computeOvershoot('road', 2)).toBeCloseTo(0.047769, 6);
    // tp = 2*acosh(zeta)/(wn*sqrt(zeta^2-1)) = 2.6339158 / (12 * 1.7320508) = 0.126724 s.
    expect(computePeakTime('road', WN, 2)).toBeCloseTo(0.126724, 6);
    expect(peakOf(integrate('road', WN, 2, 2)).overshoot).toBeCloseTo(0.047769, 6);
    expect(computeOvershoot('load', 2)).toBe(0);
    expect(computePeakTime('load', WN, 2)).toBeNull();
    const load = integrate('load', WN, 2, 2);
    for (let i = 1; i < load.x.length; i++) expect(load.x[i]).toBeGreaterThanOrEqual(load.x[i - 1] - 1e-12);
  });

  it('is continuous through zeta = 1', () => {
    for (const kind of ['road', 'load'] as const) {
      for (const t of [0.05, 0.1, 0.3]) {
        const at = stepResponseAt(kind, WN, 1, t);
        expect(stepResponseAt(kind, WN, 1 - 1e-7, t)).toBeCloseTo(at, 6);
        expect(stepResponseAt(kind, WN, 1 + 1e-7, t)).toBeCloseTo(at, 6);
      }
    }
    expect(computeOvershoot('road', 1 - 1e-5)).toBeCloseTo(Math.exp(-2), 4);
    expect(computeOvershoot('road', 1 + 1e-5)).toBeCloseTo(Math.exp(-2), 4);
  });

  it('sampleStepResponse gives n points from 0 to tEnd, finite even for long overdamped spans', () => {
    const curve = sampleStepResponse('road', WN, 0.3, 2, 201);
    expect(curve.t).toHaveLength(201);
    expect(curve.t[0]).toBe(0);
    expect(curve.t[200]).toBeCloseTo(2, 12);
    expect(curve.x[0]).toBe(0);
    const long = sampleStepResponse('road', WN, 3, 1e4, 50);
    expect(long.x.every(Number.isFinite)).toBe(true);
    expect(long.x[49]).toBeCloseTo(1, 9);
  });
});
