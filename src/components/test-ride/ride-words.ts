/**
 * The words the test-ride screens put on the loop's answers. The proposal is spelt out from its own
 * figures with the shared engine's phrasing (shared/damping), so the big words on the card can
 * never disagree with the instruction the server wrote from the same from and to.
 */
import { describeAdjusterAt, describeDamperAmount, describeTurnWay, tidyPosition, unitWord } from '@shared/damping';
import { formatNumber } from '@shared/sizing/format';
import type { DamperKind, DamperUnit, ProposedChange, RideOutcome, SymptomStrength } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import type { Choice } from '@/components/ui/segmented-choice';

export const END_WORDS: Record<EndKind, string> = { front: 'Front (fork)', rear: 'Rear (shock)' };

export const STRENGTH_CHOICES: readonly Choice<SymptomStrength>[] = [
  { value: 'slight', label: 'Slight' },
  { value: 'clear', label: 'Clear' },
  { value: 'strong', label: 'Strong' },
];

export const OUTCOME_CHOICES: readonly Choice<RideOutcome>[] = [
  { value: 'better', label: 'Better' },
  { value: 'worse', label: 'Worse' },
  { value: 'same', label: 'The same' },
];

/** A setting as it is counted: "12 clicks out", "1.25 turns out". */
export function describeSetting(unit: DamperUnit, position: number): string {
  const value = tidyPosition(position);
  return `${formatNumber(value, 2)} ${unitWord(unit, value)} out`;
}

export type ProposalWords = {
  /** "Rear rebound" */
  adjuster: string;
  /** "Turn in (clockwise)" */
  way: string;
  /** "2 clicks", "a quarter turn" */
  amount: string;
  /** "from 12 to 10 clicks out from fully closed" */
  fromTo: string;
};

export function describeProposal(change: ProposedChange, kinds?: readonly DamperKind[]): ProposalWords {
  const way = describeTurnWay(change.from, change.to);
  const to = tidyPosition(change.to);
  return {
    adjuster: describeAdjusterAt(change.end, change.adjuster, kinds),
    way: way.charAt(0).toUpperCase() + way.slice(1),
    amount: describeDamperAmount(change.unit, Math.abs(change.to - change.from)),
    fromTo: `from ${formatNumber(tidyPosition(change.from), 2)} to ${formatNumber(to, 2)} ${unitWord(change.unit, to)} out from fully closed`,
  };
}

/** Said wherever someone turns an adjuster: the damper's own stops are easily damaged. */
export const ADJUSTER_CAUTION =
  'Turn gently and count each click or quarter turn; never force an adjuster at either stop. Follow the maker’s manual for where each adjuster is, and ask a qualified mechanic when in doubt.';
