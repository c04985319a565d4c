/**
 * Where a test ride stands in the loop, and what to do next, in words: the same sentence for the
 * rider's screen and the desk's, written once beside the states the database allows.
 */

import { describeAdjusterAt } from '../damping/symptoms';
import { formatNumber } from '../sizing/format';
import type { DamperPlan, NextChange, RideOutcome } from '../types/damping';
import type { TestRideStatus } from '../types/test-ride';

export interface RideFacts {
  proposal: NextChange;
  supersededAt: unknown;
  madeAt: unknown;
  outcome: RideOutcome | null;
  undoneAt: unknown;
}

export function rideStatus(ride: RideFacts): TestRideStatus {
  if (ride.proposal.kind !== 'change') return 'no-change';
  if (ride.supersededAt) return 'superseded';
  if (!ride.madeAt) return 'to-make';
  if (!ride.outcome) return 'to-judge';
  return ride.undoneAt ? 'undone' : 'judged';
}

function judgedText(outcome: RideOutcome, undoPlan: DamperPlan | null): string {
  if (outcome === 'better') return 'Rode better. If the bike still does it, report it again for the next step.';
  if (outcome === 'same') return 'Made no difference; the change is still on the bike. Report again to try something else.';
  if (undoPlan?.atTarget) return 'Rode worse; the adjuster is back where it was before the change already.';
  if (undoPlan && undoPlan.steps.length > 0) return `Rode worse: take the change back (${undoPlan.steps.map((step) => step.instruction).join(' ')}), then report again.`;
  return `Rode worse, and it cannot be taken back by the plan: ${undoPlan?.missing.join(' ') ?? 'the adjuster is gone.'}`;
}

/** The status as a sentence; `undoPlan` is the worse ride's way back, null otherwise. */
export function describeRideStatus(ride: RideFacts, undoPlan: DamperPlan | null): string {
  const { proposal } = ride;
  if (proposal.kind !== 'change') return proposal.reason;
  const { change } = proposal;
  switch (rideStatus(ride)) {
    case 'superseded':
      return 'Not made: a later report replaced this proposal.';
    case 'to-make':
      return `Make this change, then say it is made: ${change.instruction}`;
    case 'to-judge':
      return `Made. Ride, then say whether it was better, worse or the same. ${change.feelFor}`;
    case 'undone':
      return `Rode worse and was taken back: ${describeAdjusterAt(change.end, change.adjuster)} is at ${formatNumber(change.from, 2)} again.`;
    default:
      return judgedText(ride.outcome!, undoPlan);
  }
}
