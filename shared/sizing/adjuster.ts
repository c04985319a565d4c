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

export function planAdjustment(
  adjuster: Adjuster,
  currentPreloadMm: number,
  neededPreloadMm: number,
  resolution: number,
): AdjusterPlan {
  const changeMm = neededPreloadMm - currentPreloadMm;
  const changeUnits = changeMm / adjuster.mmPerUnit;
  const minPosition = adjuster.minPosition ?? 0;
  const exact = adjuster.position + changeUnits;
  const wanted = adjuster.position + Math.round(changeUnits / resolution) * resolution;
  const position = Math.min(adjuster.maxPosition, Math.max(minPosition, wanted));
  // Float noise from the multiply would otherwise show as 1.2500000000000002 turns.
  const roundedChangeUnits = roundToNano(position - adjuster.position);
  return {
    changeMm,
    changeUnits,
    roundedChangeUnits,
    roundedChangeMm: roundedChangeUnits * adjuster.mmPerUnit,
    position: roundToNano(position),
    // Rounding onto an end stop is still rounding; only a change the adjuster cannot make is limited.
    limitedByRange: exact < minPosition - 1e-9 || exact > adjuster.maxPosition + 1e-9,
    direction: roundedChangeUnits > 0 ? 'add' : roundedChangeUnits < 0 ? 'remove' : 'none',
    unit: UNIT_OF[adjuster.kind],
  };
}

function roundToNano(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}

/** The change as a phrase, e.g. "add 1.25 turns of preload (to 6.25 turns)". */
export function describeAdjustment(
  kind: AdjusterKind,
  plan: Pick<AdjusterPlan, 'roundedChangeUnits' | 'position' | 'direction'>,
): string {
  const amount = formatNumber(Math.abs(plan.roundedChangeUnits), 2);
  const to = formatNumber(plan.position, 2);
  if (plan.direction === 'none') return 'leave the preload as it is';
  if (kind === 'spacer') {
    return `fit a spacer ${amount} mm ${plan.direction === 'add' ? 'longer' : 'shorter'} (${to} mm)`;
  }
  const unit = kind === 'threaded' ? 'turns' : 'steps';
  return `${plan.direction} ${amount} ${unit} of preload (to ${to} ${unit})`;
}
