/**
 * The next step of the test-ride loop: from what the rider felt, one damper change (or a referral
 * to the sizing, or nothing). The table's rows for the symptom and end are tried lowest priority
 * first; a row stays in play while each of its tries made things better, and is passed over once
 * one made them worse or made no difference. One change at a time: while the last change is not
 * yet judged, nothing new is proposed.
 */

import type { DamperKind, DamperAdjuster, DampingRule, NextChange, ProposedChange, SizingHint, SymptomKey, SymptomStrength, TriedChange } from '../types/damping';
import type { EndKind } from '../types/sizing';
import { formatNumber } from '../sizing/format';
import { describeDamperAmount, describeTurnWay, endStopWarning, roomToStop, tidyPosition } from './adjuster-range';
import { firstStep } from './step-size';
import { describeAdjuster, describeAdjusterAt, symptomOf } from './symptoms';

export interface NextChangeInput {
  symptom: SymptomKey;
  end: EndKind;
  strength: SymptomStrength;
  /** The end's damping adjusters as they are set now. */
  adjusters: readonly DamperAdjuster[];
  /** The table as stored; inactive rows and rows of other symptoms or ends are ignored. */
  rules: readonly DampingRule[];
  /** The changes tried for this symptom at this end, oldest first. */
  tried: readonly TriedChange[];
  /** The end's latest sizing, or null when it has none. */
  sizing: SizingHint | null;
  kinds?: readonly DamperKind[];
}

const SPRING_TOO = ' A spring too soft or preload out of place can feel the same: have the sizing for this end checked too.';

function describeWay(direction: DampingRule['direction']): string {
  return direction === 'more' ? 'more damping' : 'less damping';
}

/** Drops a closing full stop so the headline can sit inside a sentence. */
function quote(headline: string): string {
  return `“${headline.trim().replace(/\.$/, '')}”`;
}

function referToSizing(end: EndKind, sizing: SizingHint): NextChange | null {
  const opening = `This can come from the spring or its preload rather than the damping`;
  if (sizing.decision === 'change' || sizing.decision === 'marginal') {
    return {
      kind: 'spring',
      reason: `${opening}, and the ${end}'s sizing (record ${sizing.recordId}) says ${quote(sizing.headline)}. Act on that first, then ride and report again.`,
      recordId: sizing.recordId,
    };
  }
  if (sizing.decision === 'check') {
    return {
      kind: 'spring',
      reason: `${opening}, and the ${end}'s sizing (record ${sizing.recordId}) asks to check the readings first (${quote(sizing.headline)}). Check the readings first, then ride and report again.`,
      recordId: sizing.recordId,
    };
  }
  return null;
}

/** The proposal a rule makes on this adjuster, or why it makes none. */
function proposeFor(rule: DampingRule, adjuster: DamperAdjuster, input: NextChangeInput, sizingNote: string): ProposedChange | string {
  const name = `${describeAdjuster(rule.adjuster, input.kinds)} (${describeWay(rule.direction)})`;
  const tries = input.tried.filter((tried) => tried.adjuster === rule.adjuster && tried.direction === rule.direction);
  if (tries.some((tried) => tried.outcome === 'worse')) return `${name} made it worse`;
  if (tries.some((tried) => tried.outcome === 'same')) return `${name} made no difference`;

  const towardsClosed = rule.direction === 'more';
  const room = roomToStop(adjuster, adjuster.position, towardsClosed);
  if (room === 0) return `${name} has no range left (${towardsClosed ? 'fully closed' : 'fully open'})`;

  const from = tidyPosition(adjuster.position);
  const amount = Math.min(firstStep(adjuster, input.strength), room);
  const to = tidyPosition(towardsClosed ? from - amount : from + amount);
  const repeats = input.tried.some((tried) => tried.adjuster === rule.adjuster && tidyPosition(tried.from) === from && tidyPosition(tried.to) === to);
  if (repeats) return `${name} from ${formatNumber(from, 2)} to ${formatNumber(to, 2)} was tried before`;

  return {
    end: input.end,
    adjuster: rule.adjuster,
    unit: adjuster.unit,
    from,
    to,
    instruction: `${describeAdjusterAt(input.end, rule.adjuster, input.kinds)}: ${describeTurnWay(from, to)} ${describeDamperAmount(adjuster.unit, amount)}, from ${formatNumber(from, 2)} to ${formatNumber(to, 2)} out from fully closed.`,
    ruleId: rule.id,
    direction: rule.direction,
    delta: tidyPosition(to - from),
    why: rule.why + sizingNote,
    feelFor: rule.feelFor,
    endStopWarning: endStopWarning(adjuster, to),
  };
}

export function nextChange(input: NextChangeInput): NextChange {
  const { end, kinds } = input;
  const symptom = symptomOf(input.symptom);

  const pending = input.tried.find((tried) => tried.outcome === null && !tried.undone);
  if (pending) {
    return {
      kind: 'none',
      reason: `Ride with the last change first (${describeAdjusterAt(end, pending.adjuster, kinds)} from ${formatNumber(pending.from, 2)} to ${formatNumber(pending.to, 2)}) and say whether it was better, worse or the same: one change at a time.`,
    };
  }

  if (symptom.springFirst && input.sizing) {
    const referral = referToSizing(end, input.sizing);
    if (referral) return referral;
  }
  const sizingNote = symptom.springFirst && (input.sizing === null || input.sizing.decision === 'none') ? SPRING_TOO : '';

  const rows = input.rules
    .filter((rule) => rule.active && rule.symptom === symptom.key && rule.end === end)
    .sort((a, b) => a.priority - b.priority || a.id - b.id);
  if (rows.length === 0) return { kind: 'none', reason: `The table has no change for “${symptom.words}” at the ${end}.` };

  const byKind = new Map(input.adjusters.map((adjuster) => [adjuster.kind, adjuster]));
  const usable = rows.filter((rule) => byKind.has(rule.adjuster));
  if (usable.length === 0) {
    const named = [...new Set(rows.map((rule) => describeAdjuster(rule.adjuster, kinds)))];
    return {
      kind: 'none',
      reason: `The ${end} has none of the adjusters the table names for “${symptom.words}”: an adjustable ${named.join(' or ')} would help.`,
    };
  }

  const passedOver: string[] = [];
  for (const rule of usable) {
    const proposal = proposeFor(rule, byKind.get(rule.adjuster)!, input, sizingNote);
    if (typeof proposal !== 'string') return { kind: 'change', change: proposal };
    passedOver.push(proposal);
  }
  return { kind: 'none', reason: `Nothing left to try for “${symptom.words}” at the ${end}: ${passedOver.join('; ')}.` };
}
