/**
 * What a damper change does to the end's damping ratio and load-step overshoot, for the preview
 * beside a proposal. zeta = c / (2*sqrt(k*m)) (Rao, Mechanical Vibrations; Ogata, Modern Control
 * Engineering, ch. 5). Only a dyno sheet gives the damping per step: without it the preview shows
 * the direction alone, since clicks differ from damper to damper.
 */

import { DAMPER_STEP, type DamperAdjuster, type DampingDirection } from '../types/damping';
import { computeOvershoot } from '../sizing/ride-preview';

export interface DampingChangeInput {
  adjuster: DamperAdjuster;
  /** Signed, in the adjuster's unit: negative turns in (more damping). */
  delta: number;
  springRateAtWheelNPerM: number;
  sprungMassKg: number;
  /** The ratio assumed for the current setting (the ride preview's). */
  zetaNow: number;
}

export interface DampingChangeEffect {
  direction: DampingDirection;
  zetaAfter: number | null;
  overshootNow: number;
  overshootAfter: number | null;
}

export function dampingChangeEffect(input: DampingChangeInput): DampingChangeEffect {
  const { adjuster, delta, zetaNow } = input;
  if (delta === 0) throw new RangeError('A change of nothing has no direction.');
  const direction: DampingDirection = delta < 0 ? 'more' : 'less';
  const overshootNow = computeOvershoot('load', zetaNow);
  if (adjuster.dampingPerStepNsPerM === null) return { direction, zetaAfter: null, overshootNow, overshootAfter: null };

  const critical = 2 * Math.sqrt(input.springRateAtWheelNPerM * input.sprungMassKg);
  const steps = delta / DAMPER_STEP[adjuster.unit];
  // The dyno figure is the fall per step out; a damper cannot go below no damping at all.
  const dampingAfter = Math.max(0, zetaNow * critical - steps * adjuster.dampingPerStepNsPerM);
  const zetaAfter = dampingAfter / critical;
  return { direction, zetaAfter, overshootNow, overshootAfter: computeOvershoot('load', zetaAfter) };
}
