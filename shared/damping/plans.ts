/**
 * Plans for one end's damping adjusters: back to the maker's standard, back to the rider's
 * baseline, or undoing one change. Going back to a setting is written from the closed stop ("turn
 * in until it stops, then out 12 clicks") even when it is near: counting from a stop does not
 * depend on the current position being what the log says, while a relative turn would carry any
 * miscount along. An undo is relative, since it reverses one move the rider just made.
 */

import type { DamperAdjuster, DamperKind, DamperPlan, DamperStep } from '../types/damping';
import type { EndKind } from '../types/sizing';
import { formatNumber } from '../sizing/format';
import { checkDamperSetting, describeDamperAmount, describeTurnWay, tidyPosition } from './adjuster-range';
import { describeAdjusterAt } from './symptoms';

function absoluteInstruction(heading: string, adjuster: DamperAdjuster, target: number): string {
  if (target === 0) return `${heading}: turn in (clockwise) until it stops (fully closed).`;
  return `${heading}: turn in (clockwise) until it stops, then out ${describeDamperAmount(adjuster.unit, target)}.`;
}

/** Every adjuster the target names goes to it from the closed stop; the rest are listed as missing. */
function planToTargets(
  end: EndKind,
  adjusters: readonly DamperAdjuster[],
  targetOf: (adjuster: DamperAdjuster) => number | null,
  targetName: string,
  kinds?: readonly DamperKind[],
): DamperPlan {
  const steps: DamperStep[] = [];
  const missing: string[] = [];
  let settable = 0;
  for (const adjuster of adjusters) {
    const heading = describeAdjusterAt(end, adjuster.kind, kinds);
    const target = targetOf(adjuster);
    if (target === null) {
      missing.push(`${heading}: no ${targetName} is known.`);
      continue;
    }
    const problem = checkDamperSetting(adjuster, target);
    if (problem) {
      missing.push(`${heading}: the ${targetName}, ${formatNumber(target, 2)}, cannot be set on this adjuster. ${problem}`);
      continue;
    }
    settable++;
    const from = tidyPosition(adjuster.position);
    const to = tidyPosition(target);
    if (from === to) continue;
    steps.push({ end, adjuster: adjuster.kind, unit: adjuster.unit, from, to, instruction: absoluteInstruction(heading, adjuster, to) });
  }
  // With nothing settable the plan is not "there": it could not say.
  return { end, steps, missing, atTarget: settable > 0 && steps.length === 0 };
}

/** Back to the maker's standard setting, for every adjuster whose standard is known. */
export function planToStandard(end: EndKind, adjusters: readonly DamperAdjuster[], kinds?: readonly DamperKind[]): DamperPlan {
  return planToTargets(end, adjusters, (adjuster) => adjuster.standard, 'standard setting', kinds);
}

/** Back to the rider's baseline: adjuster kind -> position out from fully closed. */
export function planToBaseline(
  end: EndKind,
  adjusters: readonly DamperAdjuster[],
  baseline: Readonly<Record<string, number>>,
  kinds?: readonly DamperKind[],
): DamperPlan {
  return planToTargets(end, adjusters, (adjuster) => (Object.hasOwn(baseline, adjuster.kind) ? baseline[adjuster.kind] : null), 'baseline setting', kinds);
}

/** Takes one change back: from wherever the adjuster is now to the change's `from`. */
export function planUndo(
  end: EndKind,
  adjuster: DamperAdjuster,
  change: { from: number; to: number },
  kinds?: readonly DamperKind[],
): DamperPlan {
  const heading = describeAdjusterAt(end, adjuster.kind, kinds);
  const problem = checkDamperSetting(adjuster, change.from);
  if (problem) {
    return { end, steps: [], missing: [`${heading}: ${formatNumber(change.from, 2)} cannot be set on this adjuster any more. ${problem}`], atTarget: false };
  }
  const from = tidyPosition(adjuster.position);
  const to = tidyPosition(change.from);
  if (from === to) return { end, steps: [], missing: [], atTarget: true };
  const amount = tidyPosition(Math.abs(to - from));
  const instruction = `${heading}: ${describeTurnWay(from, to)} ${describeDamperAmount(adjuster.unit, amount)}, back to ${formatNumber(to, 2)} out from fully closed.`;
  return { end, steps: [{ end, adjuster: adjuster.kind, unit: adjuster.unit, from, to, instruction }], missing: [], atTarget: false };
}

/** The adjusters after the plan's steps are followed; those it has no step for are returned as they were. */
export function applyPlan(adjusters: readonly DamperAdjuster[], plan: DamperPlan): DamperAdjuster[] {
  return adjusters.map((adjuster) => {
    const step = plan.steps.find((candidate) => candidate.adjuster === adjuster.kind);
    return step ? { ...adjuster, position: step.to } : adjuster;
  });
}
