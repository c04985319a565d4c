/**
 * What a damping adjuster can be set to: whole steps (clicks, or quarter turns) from fully closed
 * (0) to fully open (`maxPosition`). Settings within two steps of either stop are allowed but
 * warned about: at the ends of its range a damper handles poorly (common practice, no source).
 */

import { DAMPER_STEP, type DamperAdjuster, type DamperUnit } from '../types/damping';

/** Steps from either stop that earn a warning. */
export const END_STOP_STEPS = 2;

/** Float noise from quarter turns added up is not a setting: round it off before comparing or showing a position. */
export function tidyPosition(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}

export function isWholeStep(unit: DamperUnit, position: number): boolean {
  const steps = position / DAMPER_STEP[unit];
  return Math.abs(steps - Math.round(steps)) < 1e-9;
}

export function unitWord(unit: DamperUnit, amount: number): string {
  if (unit === 'clicks') return amount === 1 ? 'click' : 'clicks';
  return amount === 1 ? 'turn' : 'turns';
}

/** Why `position` cannot be set on the adjuster, or undefined when it can. */
export function checkDamperSetting(adjuster: Pick<DamperAdjuster, 'unit' | 'maxPosition'>, position: number): string | undefined {
  const { unit, maxPosition } = adjuster;
  if (!Number.isFinite(position)) return 'The setting must be a number.';
  if (position < 0 || position > maxPosition) {
    return `The setting must be from 0 (fully closed) to ${maxPosition} ${unitWord(unit, maxPosition)} out (fully open).`;
  }
  if (!isWholeStep(unit, position)) return unit === 'clicks' ? 'Set whole clicks.' : 'Set turns in quarter turns (0.25, 0.5, 0.75).';
  return undefined;
}

/** A warning when `position` is within two steps of fully closed or fully open; null otherwise. */
export function endStopWarning(adjuster: Pick<DamperAdjuster, 'unit' | 'maxPosition'>, position: number): string | null {
  const margin = tidyPosition(END_STOP_STEPS * DAMPER_STEP[adjuster.unit]);
  const amount = `${margin} ${unitWord(adjuster.unit, margin)}`;
  if (tidyPosition(position) <= margin) return `This is within ${amount} of fully closed: a damper at the end of its range handles poorly.`;
  if (tidyPosition(adjuster.maxPosition - position) <= margin) return `This is within ${amount} of fully open: a damper at the end of its range handles poorly.`;
  return null;
}

const TURN_FRACTIONS: Readonly<Record<number, string>> = { 0.25: 'a quarter turn', 0.5: 'a half turn', 0.75: 'three quarters of a turn' };

/** An amount as a person says it: "2 clicks", "a half turn", "1.5 turns". */
export function describeDamperAmount(unit: DamperUnit, amount: number): string {
  const value = tidyPosition(amount);
  if (unit === 'turns' && TURN_FRACTIONS[value]) return TURN_FRACTIONS[value];
  return `${value} ${unitWord(unit, value)}`;
}

/** Which way to turn to go from one position to another: in (clockwise) towards closed, out away from it. */
export function describeTurnWay(from: number, to: number): string {
  return to < from ? 'turn in (clockwise)' : 'turn out (counter-clockwise)';
}

/** Remaining travel of the adjuster, in its unit, from `position` to the stop that way: fully closed for more damping. */
export function roomToStop(adjuster: Pick<DamperAdjuster, 'maxPosition'>, position: number, towardsClosed: boolean): number {
  return Math.max(0, tidyPosition(towardsClosed ? position : adjuster.maxPosition - position));
}
