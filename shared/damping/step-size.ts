/**
 * How far the first change of a test-ride loop goes, in steps (a click, or a quarter turn): big
 * enough to feel on the next ride, small enough not to overshoot on a short adjuster (common
 * practice, no source).
 */

import { DAMPER_STEP, type DamperAdjuster, type SymptomStrength } from '../types/damping';

export const STEP_RULE_TEXT =
  'One step is a click or a quarter turn. A usual change is 2 steps, or a sixth of the adjuster’s range if that is less (whole steps, at least 1). ' +
  'A slight feeling gets 1 step, a clear one the usual change, a strong one twice the usual change but no more than a quarter of the range.';

/** The change for a feeling of this strength, in the adjuster's unit (always at least one step). */
export function firstStep(adjuster: Pick<DamperAdjuster, 'unit' | 'maxPosition'>, strength: SymptomStrength): number {
  const step = DAMPER_STEP[adjuster.unit];
  const rangeSteps = Math.round(adjuster.maxPosition / step);
  const base = Math.max(1, Math.min(2, Math.floor(rangeSteps / 6)));
  const steps = strength === 'slight' ? 1 : strength === 'clear' ? base : Math.max(base, Math.min(2 * base, Math.floor(rangeSteps / 4)));
  return steps * step;
}
