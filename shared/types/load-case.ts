/**
 * A bike's load cases: solo, and each case of its latest pass (with passenger, with luggage, ...),
 * set on the spring the bike has fitted. Switching between them moves the preload adjusters and
 * goes in the setup log; the solo settings are kept so that going back is exact.
 */

import type { EndKind, LoadCaseResult } from './sizing';

/** What the bike stores while a case other than solo is set. */
export interface ActiveLoadCase {
  name: string;
  /** The adjuster positions of the solo setting, to go back to. */
  solo: Partial<Record<EndKind, number>>;
}

export interface LoadCaseOption {
  name: string;
  massKg: number;
  /** Per end the bike has and its pass advised on; an end whose pass said "check first" has none. */
  ends: Partial<Record<EndKind, LoadCaseResult>>;
}

/** GET /api/bikes/:id/load-cases. */
export interface LoadCasesAnswer {
  /** The case set now; null for solo. */
  active: string | null;
  solo: Partial<Record<EndKind, number>>;
  cases: LoadCaseOption[];
  /** The pass the cases come from; null before the bike's first pass. */
  recordId: number | null;
}

/** POST /api/bikes/:id/load-case: the case to set, null for solo. */
export interface LoadCaseSwitchInput {
  name: string | null;
}
