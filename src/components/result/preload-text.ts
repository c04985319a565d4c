/**
 * A preload change as the rider does it with a spanner: "add 1 1/2 turns", "remove 2 steps",
 * "spacer 4 mm longer". Turns are counted in quarters, as a collar or a cap is marked.
 */
import { formatNumber } from '@shared/sizing/format';
import type { AdjusterUnit } from '@shared/types/sizing';

const QUARTERS = ['', '1/4', '1/2', '3/4'] as const;

/** 1.5 → "1 1/2", 0.25 → "1/4", 2 → "2"; rounded to the nearest quarter. */
export function formatTurns(turns: number): string {
  const quarters = Math.round(Math.abs(turns) * 4);
  const whole = Math.floor(quarters / 4);
  const fraction = QUARTERS[quarters % 4];
  if (whole === 0) return fraction || '0';
  return fraction ? `${whole} ${fraction}` : String(whole);
}

/** `changeUnits` is signed: positive adds preload. */
export function formatPreloadChange(changeUnits: number, unit: AdjusterUnit): string {
  const amount = Math.abs(changeUnits);
  if (unit === 'mm') {
    if (amount === 0) return 'keep the spacer';
    return `spacer ${formatNumber(amount, 1)} mm ${changeUnits > 0 ? 'longer' : 'shorter'}`;
  }
  const verb = changeUnits > 0 ? 'add' : 'remove';
  if (unit === 'steps') {
    const steps = Math.round(amount);
    if (steps === 0) return 'keep the setting';
    return `${verb} ${steps} ${steps === 1 ? 'step' : 'steps'}`;
  }
  const text = formatTurns(amount);
  if (text === '0') return 'keep the setting';
  return `${verb} ${text} ${Math.round(amount * 4) <= 4 ? 'turn' : 'turns'}`;
}
