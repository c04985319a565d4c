/**
 * The test-ride loop and the symptom-to-change table as the API answers them. The engine's own
 * shapes (NextChange, DamperPlan, DampingRule, ...) are in ./damping; these wrap them with what a
 * screen shows beside them: the state of each ride in words, who did what and when, labels.
 */

import type { DamperPlan, DampingRule, NextChange, RideOutcome, Symptom, SymptomStrength } from './damping';
import type { GarageBike } from './garage';
import type { SetupLogEntry } from './setup-log';
import type { EndKind } from './sizing';

/**
 * to-make: a change was proposed and is waiting to be made. to-judge: made, waiting for the ride's
 * verdict. judged: better, worse or the same was said. undone: judged worse and taken back.
 * superseded: a later report came before this change was made. no-change: the loop proposed no
 * damper change (a referral to the sizing, or nothing left to try).
 */
export const TEST_RIDE_STATUSES = ['to-make', 'to-judge', 'judged', 'undone', 'superseded', 'no-change'] as const;

export type TestRideStatus = (typeof TEST_RIDE_STATUSES)[number];

export interface TestRideStamp {
  /** ISO 8601. */
  at: string;
  /** Null once that account is gone. */
  byId: number | null;
}

/** One report of what the bike did, with what the loop proposed and what became of it. */
export interface TestRideView {
  id: number;
  bikeId: number;
  end: EndKind;
  symptom: Pick<Symptom, 'key' | 'words' | 'situation'>;
  strength: SymptomStrength;
  note: string;
  reported: TestRideStamp;
  /** The loop's answer as it was given at the report; its instruction says which adjuster, which way, how far. */
  proposal: NextChange;
  status: TestRideStatus;
  /** Where the ride stands and what to do next, in words. */
  statusText: string;
  /** The proposed change put on the bike, with the setup-log entry that records it. */
  made: (TestRideStamp & { setupLogEntryId: number | null }) | null;
  outcome: (TestRideStamp & { outcome: RideOutcome; note: string }) | null;
  /** A worse change taken back, with its setup-log entry. */
  undone: (TestRideStamp & { setupLogEntryId: number | null }) | null;
  /** When a later report replaced this proposal before it was made. */
  supersededAt: string | null;
  /** For a ride judged worse and not undone: the turns back to where the adjuster was before the change. */
  undoPlan: DamperPlan | null;
}

/** GET /api/bikes/:id/test-rides. */
export interface TestRideList {
  /** Newest first. */
  rides: TestRideView[];
  /** The ride whose change is waiting to be made or judged; at most one per bike. */
  open: TestRideView | null;
}

/** POST /api/bikes/:id/test-rides (201). */
export interface TestRideReported {
  ride: TestRideView;
  /** Rides whose proposals were waiting to be made and are closed by this report. */
  superseded: number[];
  /** What happened to them, in words; null when none was waiting. */
  supersededText: string | null;
}

/** POST /api/test-rides/:id/made and /undo: the ride, the setup-log entry written, the bike as it is now. */
export interface TestRideChanged {
  ride: TestRideView;
  entry: SetupLogEntry;
  bike: GarageBike;
}

/** POST /api/test-rides/:id/outcome. */
export interface TestRideJudged {
  ride: TestRideView;
}

export const DAMPER_PLAN_TARGETS = ['standard', 'baseline'] as const;

export type DamperPlanTarget = (typeof DAMPER_PLAN_TARGETS)[number];

export interface EndDamperPlans {
  /** Back to the maker's standard settings. */
  standard: DamperPlan;
  /** Back to the settings before the setup log's first entry. */
  baseline: DamperPlan;
}

/** GET /api/bikes/:id/damper-plans. An end is null when the bike has no damping adjusters there. */
export interface DamperPlans {
  front: EndDamperPlans | null;
  rear: EndDamperPlans | null;
  /** Where the baseline comes from, in words. */
  baselineText: string;
}

/** POST /api/bikes/:id/damper-plans/:target. `plan` is the one followed; its `missing` adjusters were left as they were. */
export interface DamperPlanApplied {
  target: DamperPlanTarget;
  plan: DamperPlan;
  entry: SetupLogEntry;
  bike: GarageBike;
}

/** A row of the symptom-to-change table with its words and labels, and who added it. */
export interface DampingRuleView extends DampingRule {
  symptomWords: string;
  adjusterLabel: string;
  /** Null for the seeded rows, or once that account is gone. */
  createdById: number | null;
  createdAt: string;
  updatedAt: string;
}

/** GET /api/damping-rules: by symptom, end, then the order they are tried in. */
export interface DampingRuleList {
  rules: DampingRuleView[];
}

/** POST /api/damping-rules (201) and PATCH /api/damping-rules/:id. */
export interface DampingRuleAnswer {
  rule: DampingRuleView;
}
