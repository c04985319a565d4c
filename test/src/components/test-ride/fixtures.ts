/**
 * A bike with damping adjusters and its test rides as the API answers them, for the test-ride
 * component tests. The proposals come from the shared engine over the seeded table (common
 * practice, no source), so each carries the instruction the server would write; the bike's
 * figures are invented.
 */
import { nextChange, planToBaseline, planToStandard, planUndo, SEEDED_DAMPING_RULES, symptomOf } from '@shared/damping';
import type { DamperAdjuster, DampingRule, NextChange, ProposedChange, SymptomKey, SymptomStrength } from '@shared/types/damping';
import type { GarageBike } from '@shared/types/garage';
import type { EndKind } from '@shared/types/sizing';
import type { DamperPlans, TestRideList, TestRideStatus, TestRideView } from '@shared/types/test-ride';

export const BIKE_ID = 7;

export const KINDS = [
  { key: 'rebound', label: 'Rebound', circuit: 'rebound', speed: 'all' },
  { key: 'compression', label: 'Compression', circuit: 'compression', speed: 'all' },
  { key: 'hs-compression', label: 'High-speed compression', circuit: 'compression', speed: 'high' },
  { key: 'ls-compression', label: 'Low-speed compression', circuit: 'compression', speed: 'low' },
  { key: 'hs-rebound', label: 'High-speed rebound', circuit: 'rebound', speed: 'high' },
  { key: 'ls-rebound', label: 'Low-speed rebound', circuit: 'rebound', speed: 'low' },
] as const;

export const RULES: DampingRule[] = SEEDED_DAMPING_RULES.map((rule, index) => ({ ...rule, id: index + 1 }));

export function clicks(kind: string, position: number, maxPosition: number, standard: number | null = null): DamperAdjuster {
  return { kind, unit: 'clicks', maxPosition, standard, position, dampingPerStepNsPerM: null };
}

export function turns(kind: string, position: number, maxPosition: number, standard: number | null = null): DamperAdjuster {
  return { kind, unit: 'turns', maxPosition, standard, position, dampingPerStepNsPerM: null };
}

/** The engine's one change for a report, as the server would store it. */
export function propose(symptom: SymptomKey, end: EndKind, strength: SymptomStrength, adjusters: DamperAdjuster[]): ProposedChange {
  const answer = nextChange({ symptom, end, strength, adjusters, rules: RULES, tried: [], sizing: null, kinds: [...KINDS] });
  if (answer.kind !== 'change') throw new Error(`No change proposed: ${answer.reason}`);
  return answer.change;
}

export const FRONT_DAMPERS = [turns('rebound', 1.5, 3, 1.5)];
export const REAR_DAMPERS = [clicks('rebound', 12, 24, 12), clicks('ls-rebound', 10, 20, 10)];

export function bike(rear: DamperAdjuster[] = REAR_DAMPERS, front: DamperAdjuster[] = FRONT_DAMPERS): GarageBike {
  return {
    id: BIKE_ID,
    ownerId: 1,
    nickname: 'Blue one',
    model: null,
    loadCase: null,
    createdAt: '2026-11-30T09:00:00.000Z',
    updatedAt: '2026-11-30T09:00:00.000Z',
    draft: null,
    lastSizing: null,
    masses: { massKg: 190, frontShare: 0.5, unsprungFrontKg: 18, unsprungRearKg: 22 },
    front: {
      travelMm: 130,
      springCount: 2,
      rakeDeg: 25,
      rateNmm: 9,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 10,
      family: 'fork',
      adjuster: { kind: 'spacer', mmPerUnit: 1, position: 0, minPosition: -10, maxPosition: 20, zeroReference: 'stock spacer', addsPreload: 'longer spacer' },
      dampers: front,
    },
    rear: {
      wheelTravelMm: 135,
      shockStrokeMm: 50,
      gasForceN: null,
      linkage: null,
      rateNmm: 95,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 10,
      family: 'shock',
      adjuster: { kind: 'stepped', mmPerUnit: 2.5, position: 2, minPosition: 0, maxPosition: 6, zeroReference: 'softest step', addsPreload: 'clockwise' },
      dampers: rear,
    },
  };
}

const AT = '2026-12-01T10:00:00.000Z';
const STAMP = { at: AT, byId: 1 };

/** A ride in a given state; a worse one not taken back carries its undo plan from the adjuster's position now. */
export function ride(id: number, proposal: NextChange, status: TestRideStatus, overrides: Partial<TestRideView> = {}): TestRideView {
  const end = proposal.kind === 'change' ? proposal.change.end : 'rear';
  const { key, words, situation } = symptomOf('bounces-after-bump');
  const made = status === 'to-judge' || status === 'judged' || status === 'undone' ? { ...STAMP, setupLogEntryId: 40 + id } : null;
  return {
    id,
    bikeId: BIKE_ID,
    end,
    symptom: { key, words, situation },
    strength: 'clear',
    note: '',
    reported: STAMP,
    proposal,
    status,
    statusText: `Status of ride ${id}.`,
    made,
    outcome: null,
    undone: status === 'undone' ? { ...STAMP, setupLogEntryId: 60 + id } : null,
    supersededAt: status === 'superseded' ? AT : null,
    undoPlan: null,
    ...overrides,
  };
}

/** A change judged worse and still on the bike, with the server's way back. */
export function worseRide(id: number, change: ProposedChange, adjuster: DamperAdjuster): TestRideView {
  return ride(id, { kind: 'change', change }, 'judged', {
    outcome: { ...STAMP, outcome: 'worse', note: '' },
    undoPlan: planUndo(change.end, { ...adjuster, position: change.to }, change, [...KINDS]),
  });
}

export function list(rides: TestRideView[]): TestRideList {
  return { rides, open: rides.find((one) => one.status === 'to-make' || one.status === 'to-judge') ?? null };
}

/** The plans for the bike's adjusters as they are, with a baseline of `baseline` per end. */
export function plans(current: GarageBike, baseline: Partial<Record<EndKind, Record<string, number>>> = {}): DamperPlans {
  const of = (end: EndKind) => {
    const dampers = current[end]?.dampers ?? [];
    if (dampers.length === 0) return null;
    return { standard: planToStandard(end, dampers, [...KINDS]), baseline: planToBaseline(end, dampers, baseline[end] ?? {}, [...KINDS]) };
  };
  return { front: of('front'), rear: of('rear'), baselineText: 'The setup log is empty, so the settings now are the baseline.' };
}
