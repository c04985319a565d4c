/**
 * Preload in the adjuster's own units: turns of a threaded collar or cap, steps of a cam, or mm of
 * spacer; rounded to what a person can set.
 */

import type { Adjuster, AdjusterKind, AdjusterUnit, RangeMm } from '../types/sizing';
import { formatNumber } from './format';

export interface AdjusterPlan {
  changeMm: number;
  changeUnits: number;
  roundedChangeUnits: number;
  roundedChangeMm: number;
  /** Absolute setting after the rounded change. */
  position: number;
  limitedByRange: boolean;
  direction: 'add' | 'remove' | 'none';
  unit: AdjusterUnit;
}

const UNIT_OF: Record<AdjusterKind, AdjusterUnit> = { threaded: 'turns', stepped: 'steps', spacer: 'mm' };

export function adjusterUnit(kind: AdjusterKind): AdjusterUnit {
  return UNIT_OF[kind];
}

/** Preloads the adjuster reaches, never below the minimum that keeps the spring captive. */
export function computePreloadRange(
  adjuster: Adjuster,
  currentPreloadMm: number,
  minCaptivePreloadMm: number,
): RangeMm {
  const min = currentPreloadMm + ((adjuster.minPosition ?? 0) - adjuster.position) * adjuster.mmPerUnit;
  const max = currentPreloadMm + (adjuster.maxPosition - adjuster.position) * adjuster.mmPerUnit;
  return { min: Math.max(min, minCaptivePreloadMm), max };
}

/**
 * The settings a person can make for a needed preload: the nearest step of the resolution grid
 * (counted from the current setting), then the step on its other side. Both stay inside the
 * preload range: a stop can be set exactly, the captive minimum only from the first step above it.
 */
export function planAdjustments(
  adjuster: Adjuster,
  currentPreloadMm: number,
  neededPreloadMm: number,
  resolution: number,
  rangeMm: RangeMm,
): AdjusterPlan[] {
  const changeMm = neededPreloadMm - currentPreloadMm;
  const changeUnits = changeMm / adjuster.mmPerUnit;
  const steps = changeUnits / resolution;
  // Halves round away from zero, so removing preload rounds as adding does.
  const nearest = Math.sign(steps) * Math.round(Math.abs(steps));
  const other = nearest > steps ? Math.floor(steps) : Math.ceil(steps);
  const [low, high] = findSettableBounds(adjuster, currentPreloadMm, resolution, rangeMm);
  const limitedByRange = neededPreloadMm < rangeMm.min - 1e-9 || neededPreloadMm > rangeMm.max + 1e-9;
  const nearestPosition = clampToNano(adjuster.position + nearest * resolution, low, high);
  const otherPosition = clampToNano(adjuster.position + other * resolution, low, high);
  const plans = [planAt(adjuster, nearestPosition, changeMm, changeUnits, limitedByRange)];
  if (otherPosition !== nearestPosition) plans.push(planAt(adjuster, otherPosition, changeMm, changeUnits, limitedByRange));
  return plans;
}

function planAt(adjuster: Adjuster, position: number, changeMm: number, changeUnits: number, limitedByRange: boolean): AdjusterPlan {
  // Float noise from the multiply would otherwise show as 1.2500000000000002 turns.
  const roundedChangeUnits = roundToNano(position - adjuster.position);
  return {
    changeMm,
    changeUnits,
    roundedChangeUnits,
    roundedChangeMm: roundedChangeUnits * adjuster.mmPerUnit,
    position,
    limitedByRange,
    direction: roundedChangeUnits > 0 ? 'add' : roundedChangeUnits < 0 ? 'remove' : 'none',
    unit: UNIT_OF[adjuster.kind],
  };
}

function clampToNano(position: number, low: number, high: number): number {
  return roundToNano(Math.min(high, Math.max(low, position)));
}

/** Lowest and highest positions that may be set, the range's lower edge taken up onto the grid unless it is the stop. */
function findSettableBounds(
  adjuster: Adjuster,
  currentPreloadMm: number,
  resolution: number,
  rangeMm: RangeMm,
): [number, number] {
  const minPosition = adjuster.minPosition ?? 0;
  const lowest = adjuster.position + (rangeMm.min - currentPreloadMm) / adjuster.mmPerUnit;
  const low =
    lowest <= minPosition + 1e-9
      ? minPosition
      : adjuster.position + Math.ceil((lowest - adjuster.position) / resolution - 1e-9) * resolution;
  return [Math.min(low, adjuster.maxPosition), adjuster.maxPosition];
}

function roundToNano(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}

const UNIT_WORDS: Record<'threaded' | 'stepped', [string, string]> = {
  threaded: ['turn', 'turns'],
  stepped: ['step', 'steps'],
};

/** "1 turn", "0.25 turns", "3 steps": a count of the adjuster's units as written. */
function countOf(kind: 'threaded' | 'stepped', value: number): string {
  const figure = formatNumber(value, 2);
  const [one, many] = UNIT_WORDS[kind];
  return `${figure} ${figure === '1' || figure === '-1' ? one : many}`;
}

/** An absolute setting, e.g. "6.25 turns" or "13.5 mm" of spacer. */
export function describePosition(kind: AdjusterKind, position: number): string {
  return kind === 'spacer' ? `${formatNumber(position, 2)} mm` : countOf(kind, position);
}

/** The change as a phrase, e.g. "add 1.25 turns of preload (to 6.25 turns)". */
export function describeAdjustment(
  kind: AdjusterKind,
  plan: Pick<AdjusterPlan, 'roundedChangeUnits' | 'position' | 'direction'>,
): string {
  if (plan.direction === 'none') return 'leave the preload as it is';
  const to = describePosition(kind, plan.position);
  if (kind === 'spacer') {
    const amount = formatNumber(Math.abs(plan.roundedChangeUnits), 2);
    return `fit a spacer ${amount} mm ${plan.direction === 'add' ? 'longer' : 'shorter'} (${to})`;
  }
  return `${plan.direction} ${countOf(kind, Math.abs(plan.roundedChangeUnits))} of preload (to ${to})`;
}
