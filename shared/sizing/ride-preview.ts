/**
 * Ride preview: how the sprung mass on one end settles after a step, as a second-order system
 * m*x'' + c*x' + k*x = input (Ogata, Modern Control Engineering, ch. 5; Rao, Mechanical Vibrations).
 *  - road step: the ground rises by 1 and passes through spring and damper (c*y' + k*y);
 *  - load step: a force step whose static deflection is 1.
 * Closed forms for under-, critically and over-damped zeta. Each end alone: pitch coupling is left out.
 */

import type { PreviewCurve, StepFigures } from '../types/sizing';

export type StepKind = 'road' | 'load';

/** Within this of 1, use the critically damped forms (the others divide by sqrt(|1 - zeta^2|)). */
const CRITICAL_BAND = 1e-6;

export const PREVIEW_NOTE =
  'Each end on its own at an assumed damping ratio: the two ends are coupled in pitch, so read the curves as an indicator, not a prediction of the whole bike.';

/** Displacement at time t after a unit step, for natural frequency wn (rad/s). */
export function stepResponseAt(kind: StepKind, wn: number, zeta: number, t: number): number {
  if (t <= 0) return 0;
  // road = load + (2*zeta/wn) * d(load)/dt, since the road input adds c*y' to the force.
  const sign = kind === 'road' ? -1 : 1;
  if (Math.abs(zeta - 1) < CRITICAL_BAND) return 1 - Math.exp(-wn * t) * (1 + sign * wn * t);
  if (zeta < 1) {
    const decay = Math.exp(-zeta * wn * t);
    const root = Math.sqrt(1 - zeta * zeta);
    const wd = wn * root;
    return 1 - decay * (Math.cos(wd * t) + ((sign * zeta) / root) * Math.sin(wd * t));
  }
  // cosh and sinh written as the two decaying exponentials, so a long chart cannot overflow.
  const root = Math.sqrt(zeta * zeta - 1);
  const slow = Math.exp(-(zeta - root) * wn * t);
  const fast = Math.exp(-(zeta + root) * wn * t);
  const ratio = (sign * zeta) / root;
  return 1 - ((1 + ratio) * slow + (1 - ratio) * fast) / 2;
}

/** Peak time (s); null when the response creeps up to 1 without a peak. */
export function computePeakTime(kind: StepKind, wn: number, zeta: number): number | null {
  if (kind === 'load') return zeta < 1 - CRITICAL_BAND ? Math.PI / (wn * Math.sqrt(1 - zeta * zeta)) : null;
  // The road step always overshoots: its zero at -wn/(2*zeta) lies nearer the origin than either pole.
  if (Math.abs(zeta - 1) < CRITICAL_BAND) return 2 / wn;
  if (zeta < 1) return (Math.PI - 2 * Math.asin(zeta)) / (wn * Math.sqrt(1 - zeta * zeta));
  return (2 * Math.acosh(zeta)) / (wn * Math.sqrt(zeta * zeta - 1));
}

/** Overshoot as a fraction of the step. */
export function computeOvershoot(kind: StepKind, zeta: number): number {
  if (kind === 'load') {
    return zeta < 1 - CRITICAL_BAND ? Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta)) : 0;
  }
  // Mp = exp(-zeta*wn*tp) for every zeta; written without wn.
  if (Math.abs(zeta - 1) < CRITICAL_BAND) return Math.exp(-2);
  if (zeta < 1) return Math.exp((-zeta * (Math.PI - 2 * Math.asin(zeta))) / Math.sqrt(1 - zeta * zeta));
  return Math.exp((-2 * zeta * Math.acosh(zeta)) / Math.sqrt(zeta * zeta - 1));
}

function figuresFor(kind: StepKind, wn: number, zeta: number): StepFigures {
  return { overshoot: computeOvershoot(kind, zeta), peakTimeS: computePeakTime(kind, wn, zeta) };
}

export function describePreviewCurve(wnRadS: number, zeta: number): PreviewCurve {
  return { wnRadS, zeta, road: figuresFor('road', wnRadS, zeta), load: figuresFor('load', wnRadS, zeta) };
}

/** n samples from 0 to tEnd inclusive, for the chart. */
export function sampleStepResponse(
  kind: StepKind,
  wn: number,
  zeta: number,
  tEnd: number,
  n: number,
): { t: number[]; x: number[] } {
  const count = Math.max(2, Math.floor(n));
  const t: number[] = new Array(count);
  const x: number[] = new Array(count);
  for (let i = 0; i < count; i++) {
    t[i] = (tEnd * i) / (count - 1);
    x[i] = stepResponseAt(kind, wn, zeta, t[i]);
  }
  return { t, x };
}

/** Chart span: three periods of the slower undamped curve. */
export function choosePreviewDuration(...wnRadS: number[]): number {
  return (3 * 2 * Math.PI) / Math.min(...wnRadS);
}
