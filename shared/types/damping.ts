/**
 * Damping adjusters, test rides and the rules that turn what a rider felt into one change at a
 * time. Every position is counted out from fully closed: 0 is the adjuster turned clockwise all
 * the way in (most damping), the convention of service manuals; `maxPosition` is fully open.
 */

import type { EndKind } from './sizing';

export const DAMPER_UNITS = ['clicks', 'turns'] as const;

export type DamperUnit = (typeof DAMPER_UNITS)[number];

/** The smallest change a person makes: one click, or a quarter turn. */
export const DAMPER_STEP: Record<DamperUnit, number> = { clicks: 1, turns: 0.25 };

export const DAMPER_CIRCUITS = ['rebound', 'compression'] as const;

export type DamperCircuit = (typeof DAMPER_CIRCUITS)[number];

/** Which shaft speeds an adjuster works on: all of them, or the high- or low-speed side of a split adjuster. */
export const DAMPER_SPEEDS = ['all', 'high', 'low'] as const;

export type DamperSpeed = (typeof DAMPER_SPEEDS)[number];

/** A kind of adjuster on the shop's list (`damper_kind`); the six of the trade are seeded, a shop may add its own. */
export interface DamperKind {
  /** Lower-case words joined by '-': 'rebound', 'hs-compression'. */
  key: string;
  label: string;
  circuit: DamperCircuit;
  speed: DamperSpeed;
}

/** One damping adjuster of one end. A bike has each kind at most once per end. */
export interface DamperAdjuster {
  /** A DamperKind key. */
  kind: string;
  unit: DamperUnit;
  /** Fully open, in `unit` out from fully closed; a whole number of steps. */
  maxPosition: number;
  /** The maker's standard setting as the service manual prints it; null when not known. */
  standard: number | null;
  /** Where it is set now. */
  position: number;
  /**
   * From a dyno sheet only: how much the end's damping coefficient at the wheel falls per step
   * out, in N s/m. Null (the usual case): clicks are damper-specific, so the preview shows the
   * direction of a change, never a size.
   */
  dampingPerStepNsPerM: number | null;
}

/** More damping is turning in (clockwise, towards closed); less is turning out. */
export type DampingDirection = 'more' | 'less';

/** How strongly the rider felt it. */
export const SYMPTOM_STRENGTHS = ['slight', 'clear', 'strong'] as const;

export type SymptomStrength = (typeof SYMPTOM_STRENGTHS)[number];

export const SYMPTOM_KEYS = [
  'dives-braking',
  'bounces-after-bump',
  'harsh-small-bumps',
  'wallows-long-corners',
  'sinks-repeated-bumps',
  'bottoms-big-hits',
  'kicks-after-dip',
  'runs-wide-throttle',
  'chatters-corners',
  'squats-throttle',
] as const;

export type SymptomKey = (typeof SYMPTOM_KEYS)[number];

/** What the bike did, in the rider's words, and where the cause may instead be the spring or its preload. */
export interface Symptom {
  key: SymptomKey;
  /** As the rider says it: "Keeps bouncing after a bump". */
  words: string;
  /** When it happens, shown under the words. */
  situation: string;
  /** The ends it can be reported for. */
  ends: readonly EndKind[];
  /** True where a spring too soft or preload out of place gives the same feeling: the sizing is looked at first. */
  springFirst: boolean;
}

/**
 * What a rule claims a change does, checked against the step response of the ride preview
 * (test/shared/damping/rule-physics.test.ts): each claim holds in one direction only.
 */
export const DAMPING_CLAIMS = ['less-overshoot', 'slower-dive', 'softer-on-sharp-bumps', 'faster-recovery'] as const;

export type DampingClaim = (typeof DAMPING_CLAIMS)[number];

export const RULE_SOURCES = ['common-practice', 'shop'] as const;

export type RuleSource = (typeof RULE_SOURCES)[number];

/** One row of the symptom-to-change table: for a symptom at an end, an adjuster to try and which way. */
export interface DampingRule {
  id: number;
  symptom: SymptomKey;
  end: EndKind;
  /** A DamperKind key. */
  adjuster: string;
  direction: DampingDirection;
  /** Rules of one symptom and end are tried lowest first. */
  priority: number;
  /** Why this change, in a sentence. */
  why: string;
  /** What to feel for on the next ride. */
  feelFor: string;
  /** The step-response claim it makes, or null when it makes none. */
  claim: DampingClaim | null;
  source: RuleSource;
  active: boolean;
}

export const RIDE_OUTCOMES = ['better', 'worse', 'same'] as const;

export type RideOutcome = (typeof RIDE_OUTCOMES)[number];

/** A change tried for a symptom, and what the rider said of it (null until the next ride). */
export interface TriedChange {
  ruleId: number | null;
  adjuster: string;
  direction: DampingDirection;
  from: number;
  to: number;
  outcome: RideOutcome | null;
  /** Taken back after a worse ride. */
  undone: boolean;
}

/** The end's latest sizing, as far as the loop needs it. */
export interface SizingHint {
  recordId: number;
  /** The decision's kind for this end (keep, marginal, change, check, none). */
  decision: 'keep' | 'marginal' | 'change' | 'check' | 'none';
  /** The decision's first step in words, for the referral. */
  headline: string;
}

/** One setting of one adjuster, with the words a person follows. */
export interface DamperStep {
  end: EndKind;
  adjuster: string;
  unit: DamperUnit;
  from: number;
  to: number;
  /** "Rebound: turn in (clockwise) until it stops, then out 12 clicks." */
  instruction: string;
}

export interface ProposedChange extends DamperStep {
  ruleId: number;
  direction: DampingDirection;
  /** Signed steps' worth in `unit`: negative turns in (more damping). */
  delta: number;
  why: string;
  feelFor: string;
  /** Set when the new setting is within two steps of fully closed or fully open. */
  endStopWarning: string | null;
}

export type NextChange =
  | { kind: 'change'; change: ProposedChange }
  /** The symptom points at the spring or its preload: the sizing says so, and no damper change is proposed. */
  | { kind: 'spring'; reason: string; recordId: number | null }
  /** Nothing left to try within the adjusters' ranges and the table. */
  | { kind: 'none'; reason: string };

/** A plan of steps for one end: back to the maker's standard, to the rider's baseline, or undoing a change. */
export interface DamperPlan {
  end: EndKind;
  steps: DamperStep[];
  /** Adjusters the plan cannot set (no standard known, no baseline recorded), in words. */
  missing: string[];
  /** Already there: no step. */
  atTarget: boolean;
}
