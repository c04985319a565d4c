/**
 * Preload in the adjuster's own units: turns of a threaded collar or cap, steps of a cam, or mm of
 * spacer; and the words a person sets them by. Turns are written in quarters where they fall on a
 * quarter, as a collar or a cap is marked.
 */

import type { Adjuster, AdjusterKind, AdjusterUnit, RangeMm } from '../types/sizing';
import { formatNumber } from './format';

const UNIT_OF: Record<AdjusterKind, AdjusterUnit> = { threaded: 'turns', stepped: 'steps', spacer: 'mm' };

export function adjusterUnit(kind: AdjusterKind): AdjusterUnit {
  return UNIT_OF[kind];
}

/** Preloads the adjuster reaches, never below the minimum that keeps the spring captive. */
export function computePreloadRange(adjuster: Adjuster, currentPreloadMm: number, minCaptivePreloadMm: number): RangeMm {
  const min = currentPreloadMm + ((adjuster.minPosition ?? 0) - adjuster.position) * adjuster.mmPerUnit;
  const max = currentPreloadMm + (adjuster.maxPosition - adjuster.position) * adjuster.mmPerUnit;
  return { min: Math.max(min, minCaptivePreloadMm), max };
}

const QUARTERS = ['', '1/4', '1/2', '3/4'] as const;

/** 1.5 → "1 1/2", 0.25 → "1/4", 2 → "2"; a count off the quarters (0.3 turns) in decimals. */
export function formatTurnCount(turns: number): string {
  const magnitude = Math.abs(turns);
  const quarters = Math.round(magnitude * 4);
  if (Math.abs(quarters - magnitude * 4) > 1e-6) return formatNumber(magnitude, 2);
  const whole = Math.floor(quarters / 4);
  const fraction = QUARTERS[quarters % 4];
  if (whole === 0) return fraction || '0';
  return fraction ? `${whole} ${fraction}` : String(whole);
}

/** "1 turn", "3/4 turn", "1 1/2 turns", "3 steps". */
function countOf(unit: 'turns' | 'steps', value: number): string {
  if (unit === 'steps') {
    const figure = formatNumber(Math.abs(value), 2);
    return `${figure} ${figure === '1' ? 'step' : 'steps'}`;
  }
  const figure = formatTurnCount(value);
  return `${figure} ${Math.abs(value) <= 1 + 1e-9 && figure !== '0' ? 'turn' : 'turns'}`;
}

/** An absolute setting, e.g. "6 1/4 turns", "3 steps" or "13.5 mm" of spacer. */
export function describePosition(unit: AdjusterUnit, position: number): string {
  if (unit === 'mm') return `${formatNumber(position, 2)} mm`;
  return `${position < 0 ? '-' : ''}${countOf(unit, position)}`;
}

export interface AdjustmentPhrase {
  /** Signed, in adjuster units: positive adds preload. */
  roundedChangeUnits: number;
  position: number;
  direction: 'add' | 'remove' | 'none';
}

/** The change as a phrase, e.g. "add 1 1/4 turns of preload (to 6 1/4 turns)". */
export function describeAdjustment(unit: AdjusterUnit, plan: AdjustmentPhrase): string {
  if (plan.direction === 'none') return 'leave the preload as it is';
  const to = describePosition(unit, plan.position);
  if (unit === 'mm') {
    const amount = formatNumber(Math.abs(plan.roundedChangeUnits), 2);
    return `fit a spacer ${amount} mm ${plan.direction === 'add' ? 'longer' : 'shorter'} (${to})`;
  }
  return `${plan.direction} ${countOf(unit, plan.roundedChangeUnits)} of preload (to ${to})`;
}

/** The change alone, short, as a card's heading: "add 1 1/2 turns", "remove 2 steps", "fit a spacer 4 mm longer". */
export function describeChange(unit: AdjusterUnit, changeUnits: number): string {
  const amount = Math.abs(changeUnits);
  if (unit === 'mm') {
    if (amount < 1e-9) return 'keep the spacer';
    return `fit a spacer ${formatNumber(amount, 2)} mm ${changeUnits > 0 ? 'longer' : 'shorter'}`;
  }
  if (amount < 1e-9) return 'keep the setting';
  return `${changeUnits > 0 ? 'add' : 'remove'} ${countOf(unit, changeUnits)}`;
}
