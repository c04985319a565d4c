/**
 * Back to baseline: per adjuster, what to turn and which way to undo every change since the
 * baseline. Preload goes back in the adjuster's own units, the direction in words from the bike's
 * "which way adds preload"; damping adjusters go back in their clicks or turns (counted out from
 * fully closed); springs go back to the baseline's rates. The order of work is springs, then
 * preload, then damping, since a spring is swapped with the preload backed off.
 */

import type { PreloadAdjuster, PreloadDirection } from '../types/bike';
import type { DamperUnit } from '../types/damping';
import type { EndKind } from '../types/sizing';
import type { BackToBaseline, DamperUndo, EndSettings, EndUndo, PreloadUndo, PreloadWay, SetupSettings, SpringSetting, SpringUndo } from '../types/setup-log';
import { adjusterUnit } from '../sizing/adjuster';
import { formatNumber } from '../sizing/format';
import { damperAmount, damperName, type DamperLabels } from './damper-words';
import { damperUnitFor, isSameSpring, springOf, type DamperUnits } from './settings';

const ENDS: readonly EndKind[] = ['front', 'rear'];
const END_NAME: Record<EndKind, string> = { front: 'Front', rear: 'Rear' };
const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

/** Adjuster positions are set in quarter turns, whole steps or half millimetres; anything below a nano-unit is float noise. */
function tidy(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}

function plural(amount: number, one: string, many: string): string {
  return amount === 1 ? one : many;
}

function opposite(direction: Exclude<PreloadDirection, 'longer spacer'>): Exclude<PreloadDirection, 'longer spacer'> {
  return direction === 'clockwise' ? 'counter-clockwise' : 'clockwise';
}

/** Which way to work the adjuster to add (or remove) preload. */
export function preloadWay(adjuster: Pick<PreloadAdjuster, 'kind' | 'addsPreload'>, add: boolean): PreloadWay {
  if (adjuster.kind === 'spacer' || adjuster.addsPreload === 'longer spacer') return add ? 'longer spacer' : 'shorter spacer';
  return add ? adjuster.addsPreload : opposite(adjuster.addsPreload);
}

function describeSpring(spring: SpringSetting): string {
  const rate =
    spring.secondRateNmm !== null
      ? `${formatNumber(spring.rateNmm, 2)}/${formatNumber(spring.secondRateNmm, 2)} N/mm dual-rate`
      : `${formatNumber(spring.rateNmm, 2)} N/mm`;
  return `${rate} spring (${spring.family})`;
}

function undoSpring(end: EndKind, baseline: EndSettings, current: EndSettings): SpringUndo | null {
  if (isSameSpring(baseline, current)) return null;
  const from = springOf(current);
  const to = springOf(baseline);
  return { from, to, instruction: `${END_NAME[end]} spring: fit the ${describeSpring(to)} again in place of the ${describeSpring(from)}.` };
}

function undoPreload(end: EndKind, baseline: EndSettings, current: EndSettings, adjuster: PreloadAdjuster): PreloadUndo | null {
  const changeUnits = tidy(baseline.preloadPosition - current.preloadPosition);
  if (changeUnits === 0) return null;
  const add = changeUnits > 0;
  const amount = Math.abs(changeUnits);
  const unit = adjusterUnit(adjuster.kind);
  const way = preloadWay(adjuster, add);
  const target = formatNumber(baseline.preloadPosition, 2);
  const from = adjuster.zeroReference ? ` from ${adjuster.zeroReference}` : '';
  const more = add ? 'more preload' : 'less preload';
  let action: string;
  if (unit === 'mm') {
    action = `fit a spacer ${formatNumber(amount, 2)} mm ${add ? 'longer' : 'shorter'} (${more}), back to ${target} mm${from}`;
  } else {
    const noun = unit === 'turns' ? plural(amount, 'turn', 'turns') : plural(amount, 'step', 'steps');
    const what = adjuster.kind === 'stepped' ? 'the cam' : 'the adjuster';
    action = `turn ${what} ${formatNumber(amount, 2)} ${noun} ${way} (${more}), back to ${target} ${unit}${from}`;
  }
  return {
    fromPosition: current.preloadPosition,
    toPosition: baseline.preloadPosition,
    changeUnits,
    amount,
    unit,
    direction: add ? 'add' : 'remove',
    way,
    instruction: `${END_NAME[end]} preload: ${action}.`,
  };
}

function undoDamper(end: EndKind, kind: string, unit: DamperUnit, baseline: number, current: number, labels: DamperLabels): DamperUndo | null {
  // Positive is out from fully closed; quarter turns added up leave float noise.
  const change = tidy(baseline - current);
  if (change === 0) return null;
  const amount = Math.abs(change);
  const direction = change > 0 ? 'out' : 'in';
  return {
    adjuster: kind,
    unit,
    from: current,
    to: baseline,
    amount,
    direction,
    instruction: `${END_NAME[end]} ${damperName(kind, labels)}: ${damperAmount(unit, amount)} ${direction}, back to ${formatNumber(baseline, 2)} out from fully closed.`,
  };
}

function undoDampers(end: EndKind, baseline: EndSettings, current: EndSettings, options: DamperWords, notes: string[]): DamperUndo[] {
  const { units = {}, labels = {} } = options;
  const undone: DamperUndo[] = [];
  for (const [kind, is] of Object.entries(current.dampers)) {
    const was = baseline.dampers[kind];
    if (was === undefined) {
      notes.push(`The ${PART[end]}'s ${damperName(kind, labels)} adjuster was added since the baseline: set it by hand.`);
      continue;
    }
    const undo = undoDamper(end, kind, damperUnitFor(units, end, kind, [was, is]), was, is, labels);
    if (undo) undone.push(undo);
  }
  for (const kind of Object.keys(baseline.dampers)) {
    if (!(kind in current.dampers)) notes.push(`The ${PART[end]}'s ${damperName(kind, labels)} adjuster was removed since the baseline: set it by hand.`);
  }
  return undone;
}

function undoEnd(end: EndKind, baseline: EndSettings, current: EndSettings, adjuster: PreloadAdjuster, options: DamperWords, notes: string[]): EndUndo {
  const dampers = undoDampers(end, baseline, current, options, notes);
  const spring = undoSpring(end, baseline, current);
  const preload = undoPreload(end, baseline, current, adjuster);
  return { end, atBaseline: !spring && !preload && dampers.length === 0, spring, preload, dampers };
}

/** How the damping adjusters are counted (the bike's now, `damperUnitsOf`) and named (the shop's list; else their keys). */
export interface DamperWords {
  units?: DamperUnits;
  labels?: DamperLabels;
}

/**
 * The plan from the current settings back to the baseline. `adjusters` are the bike's preload
 * adjusters as they are now (their kind, zero and which way adds preload).
 */
export function planBackToBaseline(
  baseline: SetupSettings,
  current: SetupSettings,
  adjusters: Partial<Record<EndKind, PreloadAdjuster>>,
  dampers: DamperWords = {},
): BackToBaseline {
  const notes: string[] = [];
  const undone: Partial<Record<EndKind, EndUndo>> = {};
  for (const end of ENDS) {
    const was = baseline[end];
    const is = current[end];
    const adjuster = adjusters[end];
    if (was && is && adjuster) undone[end] = undoEnd(end, was, is, adjuster, dampers, notes);
    else if (was && !is) notes.push(`The bike has no ${PART[end]} recorded now, so the baseline's ${PART[end]} settings cannot be restored here.`);
    else if (!was && is) notes.push(`The ${PART[end]} was added to the bike after the baseline: it has no baseline to go back to.`);
  }
  const plans = ENDS.map((end) => undone[end]).filter((u): u is EndUndo => u !== undefined);
  const steps = [
    ...plans.flatMap((u) => (u.spring ? [u.spring.instruction] : [])),
    ...plans.flatMap((u) => (u.preload ? [u.preload.instruction] : [])),
    ...plans.flatMap((u) => u.dampers.map((d) => d.instruction)),
  ];
  return {
    atBaseline: steps.length === 0,
    front: undone.front ?? null,
    rear: undone.rear ?? null,
    steps,
    notes,
  };
}
