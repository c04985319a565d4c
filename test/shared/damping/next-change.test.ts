/**
 * The test-ride loop's next step. The rows are the seed (common practice, no source) and the step
 * sizes follow the rule of step-size.ts; every expected position below is worked by hand from them.
 */
import * as fc from 'fast-check';
import { isWholeStep, nextChange, SEEDED_DAMPING_RULES, SYMPTOMS, symptomOf, type NextChangeInput } from '@shared/damping';
import {
  DAMPER_STEP,
  SYMPTOM_KEYS,
  type DamperAdjuster,
  type DampingDirection,
  type DampingRule,
  type RideOutcome,
  type SizingHint,
  type TriedChange,
} from '@shared/types/damping';

const RULES: DampingRule[] = SEEDED_DAMPING_RULES.map((rule, index) => ({ ...rule, id: index + 1 }));

function ruleId(symptom: string, end: string, adjuster: string): number {
  return RULES.find((rule) => rule.symptom === symptom && rule.end === end && rule.adjuster === adjuster)!.id;
}

function clicks(kind: string, position: number, maxPosition = 20): DamperAdjuster {
  return { kind, unit: 'clicks', maxPosition, standard: null, position, dampingPerStepNsPerM: null };
}

function turns(kind: string, position: number, maxPosition = 3): DamperAdjuster {
  return { kind, unit: 'turns', maxPosition, standard: null, position, dampingPerStepNsPerM: null };
}

function tried(adjuster: string, direction: DampingDirection, from: number, to: number, outcome: RideOutcome | null, undone = false): TriedChange {
  return { ruleId: null, adjuster, direction, from, to, outcome, undone };
}

function sizing(decision: SizingHint['decision']): SizingHint {
  return { recordId: 7, decision, headline: 'Fit a stiffer spring and set its preload.' };
}

function input(overrides: Partial<NextChangeInput>): NextChangeInput {
  return { symptom: 'bounces-after-bump', end: 'front', strength: 'clear', adjusters: [], rules: RULES, tried: [], sizing: null, ...overrides };
}

interface Expected {
  kind: 'change' | 'spring' | 'none';
  adjuster?: string;
  direction?: DampingDirection;
  from?: number;
  to?: number;
  /** null: no warning; a pattern: the warning says it. */
  warning?: RegExp | null;
  /** Matched against the reason ('spring', 'none') or the why ('change'). */
  text?: RegExp;
}

const CASES: [string, Partial<NextChangeInput>, Expected][] = [
  // One change at a time: 20 clicks, clear -> base min(2, floor(20/6) = 3) = 2 clicks, in.
  ['bouncing, clear: rebound in 2 clicks', { adjusters: [clicks('rebound', 12)] }, { kind: 'change', adjuster: 'rebound', direction: 'more', from: 12, to: 10, warning: null }],
  ['bouncing, slight: 1 click', { strength: 'slight', adjusters: [clicks('rebound', 12)] }, { kind: 'change', from: 12, to: 11 }],
  // strong: min(2 * 2, floor(20/4) = 5) = 4.
  ['bouncing, strong: 4 clicks', { strength: 'strong', adjusters: [clicks('rebound', 12)] }, { kind: 'change', from: 12, to: 8 }],
  ['the plain adjuster comes first where the end has both', { adjusters: [clicks('ls-rebound', 10), clicks('rebound', 12)] }, { kind: 'change', adjuster: 'rebound' }],
  ['a split adjuster alone is used', { end: 'rear', adjusters: [clicks('ls-rebound', 10)] }, { kind: 'change', adjuster: 'ls-rebound', direction: 'more', from: 10, to: 8 }],

  // Worse and same: the row is passed over, the next one tried.
  [
    'worse: passed over for the next row',
    { adjusters: [clicks('rebound', 12), clicks('ls-rebound', 10)], tried: [tried('rebound', 'more', 12, 10, 'worse', true)] },
    { kind: 'change', adjuster: 'ls-rebound', from: 10, to: 8 },
  ],
  [
    'same: passed over, the next row starts from where the adjusters are',
    { adjusters: [clicks('rebound', 10), clicks('ls-rebound', 10)], tried: [tried('rebound', 'more', 12, 10, 'same')] },
    { kind: 'change', adjuster: 'ls-rebound', from: 10, to: 8 },
  ],
  [
    'worse with no other row: nothing left, and says why',
    { adjusters: [clicks('rebound', 12)], tried: [tried('rebound', 'more', 12, 10, 'worse', true)] },
    { kind: 'none', text: /rebound \(more damping\) made it worse/ },
  ],
  [
    'a better try of the opposite way does not count against this row',
    { adjusters: [clicks('rebound', 12)], tried: [tried('rebound', 'less', 10, 12, 'better')] },
    { kind: 'change', adjuster: 'rebound', from: 12, to: 10 },
  ],

  // Unjudged: ride first.
  ['unjudged: ride and report first', { adjusters: [clicks('rebound', 10)], tried: [tried('rebound', 'more', 12, 10, null)] }, { kind: 'none', text: /Ride with the last change first \(Front rebound from 12 to 10\)/ }],

  // Better: one more step from the new setting, as big as this ride's feeling asks.
  ['better: one more step from the new setting', { adjusters: [clicks('rebound', 10)], tried: [tried('rebound', 'more', 12, 10, 'better')] }, { kind: 'change', adjuster: 'rebound', from: 10, to: 8 }],
  [
    'better, now only slight: one click more',
    { strength: 'slight', adjusters: [clicks('rebound', 8)], tried: [tried('rebound', 'more', 12, 10, 'better'), tried('rebound', 'more', 10, 8, 'better')] },
    { kind: 'change', from: 8, to: 7 },
  ],

  // No repeats: back at 12 after a better 12 -> 10, the same move is not offered again.
  [
    'never the same (adjuster, from, to) twice',
    { adjusters: [clicks('rebound', 12)], tried: [tried('rebound', 'more', 12, 10, 'better'), tried('rebound', 'less', 10, 12, 'worse', false)] },
    { kind: 'none', text: /from 12 to 10 was tried before/ },
  ],
  [
    'an undone change that was never ridden is not offered again either',
    { adjusters: [clicks('rebound', 12)], tried: [tried('rebound', 'more', 12, 10, null, true)] },
    { kind: 'none', text: /was tried before/ },
  ],

  // Clamped at the stop, and stopping when the range is used up.
  ['clamped: 1 click from closed, a 2-click step becomes 1', { adjusters: [clicks('rebound', 1)] }, { kind: 'change', from: 1, to: 0, warning: /within 2 clicks of fully closed/ }],
  ['clamped at the open stop', { symptom: 'sinks-repeated-bumps', adjusters: [clicks('rebound', 19)] }, { kind: 'change', direction: 'less', from: 19, to: 20, warning: /fully open/ }],
  ['at the stop: the range is used up', { adjusters: [clicks('rebound', 0)] }, { kind: 'none', text: /no range left \(fully closed\)/ }],
  [
    'at the stop on one adjuster, the next row goes on',
    { adjusters: [clicks('rebound', 0), clicks('ls-rebound', 6)] },
    { kind: 'change', adjuster: 'ls-rebound', from: 6, to: 4, warning: null },
  ],
  [
    'every row used up: says so for each',
    { symptom: 'sinks-repeated-bumps', end: 'rear', adjusters: [clicks('rebound', 20), clicks('ls-rebound', 12)], tried: [tried('ls-rebound', 'less', 10, 12, 'same')] },
    { kind: 'none', text: /rebound \(less damping\) has no range left \(fully open\); low-speed rebound \(less damping\) made no difference/ },
  ],

  // Spring first.
  ['bottoming on a spring the sizing would change: the sizing', { symptom: 'bottoms-big-hits', adjusters: [clicks('compression', 10)], sizing: sizing('change') }, { kind: 'spring', text: /record 7\) says “Fit a stiffer spring and set its preload”/ }],
  ['bottoming with a marginal sizing: the sizing', { symptom: 'bottoms-big-hits', adjusters: [clicks('compression', 10)], sizing: sizing('marginal') }, { kind: 'spring' }],
  ['squatting with readings to check: check them first', { symptom: 'squats-throttle', end: 'rear', adjusters: [clicks('compression', 10)], sizing: sizing('check') }, { kind: 'spring', text: /check the readings first/ }],
  [
    'bottoming on a spring the sizing keeps: the damper',
    { symptom: 'bottoms-big-hits', adjusters: [clicks('compression', 10), clicks('hs-compression', 10)], sizing: sizing('keep') },
    { kind: 'change', adjuster: 'hs-compression', direction: 'more', from: 10, to: 8 },
  ],
  [
    'bottoming with no sizing: the damper, and the sizing to check too',
    { symptom: 'bottoms-big-hits', end: 'rear', adjusters: [clicks('compression', 10)] },
    { kind: 'change', adjuster: 'compression', from: 10, to: 8, text: /have the sizing for this end checked too/ },
  ],
  ['a symptom that is not the spring ignores the sizing', { adjusters: [clicks('rebound', 12)], sizing: sizing('change') }, { kind: 'change', adjuster: 'rebound' }],

  // An end without the adjusters the table names.
  [
    'harsh on a fork with rebound only: which adjusters would help',
    { symptom: 'harsh-small-bumps', adjusters: [clicks('rebound', 12)] },
    { kind: 'none', text: /an adjustable high-speed compression or compression would help/ },
  ],
  ['a symptom the table has no row for at this end', { symptom: 'squats-throttle', end: 'front', adjusters: [clicks('compression', 10)] }, { kind: 'none', text: /no change for “Squats under power” at the front/ }],

  // End-stop warnings within 2 steps, clicks and turns.
  ['to 2 clicks from closed: warned', { adjusters: [clicks('rebound', 4)] }, { kind: 'change', to: 2, warning: /within 2 clicks of fully closed/ }],
  ['to 3 clicks from closed: not warned', { adjusters: [clicks('rebound', 5)] }, { kind: 'change', to: 3, warning: null }],
  ['to 2 clicks from open: warned', { symptom: 'sinks-repeated-bumps', adjusters: [clicks('rebound', 16)] }, { kind: 'change', to: 18, warning: /within 2 clicks of fully open/ }],
  // 3 turns = 12 quarter turns: clear -> a half turn.
  ['turns: a half turn in, not warned at 1 turn', { adjusters: [turns('rebound', 1.5)] }, { kind: 'change', from: 1.5, to: 1, warning: null }],
  ['turns: to a half turn from closed, warned', { adjusters: [turns('rebound', 1)] }, { kind: 'change', from: 1, to: 0.5, warning: /within 0.5 turns of fully closed/ }],
  ['turns: slight is a quarter turn', { strength: 'slight', adjusters: [turns('rebound', 1.5)] }, { kind: 'change', from: 1.5, to: 1.25 }],
  ['turns: clamped to the quarter turn left', { symptom: 'sinks-repeated-bumps', adjusters: [turns('rebound', 2.75)] }, { kind: 'change', from: 2.75, to: 3, warning: /fully open/ }],
];

describe('nextChange: cases', () => {
  it.each(CASES)('%s', (_name, overrides, expected) => {
    const answer = nextChange(input(overrides));
    expect(answer.kind).toBe(expected.kind);
    if (answer.kind === 'change') {
      const { change } = answer;
      if (expected.adjuster) expect(change.adjuster).toBe(expected.adjuster);
      if (expected.direction) expect(change.direction).toBe(expected.direction);
      if (expected.from !== undefined) expect(change.from).toBe(expected.from);
      if (expected.to !== undefined) expect(change.to).toBe(expected.to);
      if (expected.warning === null) expect(change.endStopWarning).toBeNull();
      else if (expected.warning) expect(change.endStopWarning).toMatch(expected.warning);
      if (expected.text) expect(change.why).toMatch(expected.text);
    } else if (expected.text) {
      expect(answer.reason).toMatch(expected.text);
    }
    if (answer.kind === 'spring') expect(answer.recordId).toBe(7);
  });

  it('words the change as a person makes it, with the row it came from', () => {
    const answer = nextChange(input({ adjusters: [clicks('rebound', 12)] }));
    expect(answer).toEqual({
      kind: 'change',
      change: expect.objectContaining({
        end: 'front',
        unit: 'clicks',
        ruleId: ruleId('bounces-after-bump', 'front', 'rebound'),
        delta: -2,
        instruction: 'Front rebound: turn in (clockwise) 2 clicks, from 12 to 10 out from fully closed.',
        why: RULES.find((rule) => rule.id === ruleId('bounces-after-bump', 'front', 'rebound'))!.why,
      }),
    });
    const out = nextChange(input({ symptom: 'sinks-repeated-bumps', end: 'rear', adjusters: [turns('ls-rebound', 1)] }));
    expect(out.kind === 'change' && out.change.instruction).toBe('Rear low-speed rebound: turn out (counter-clockwise) a half turn, from 1 to 1.5 out from fully closed.');
    expect(out.kind === 'change' && out.change.delta).toBe(0.5);
  });

  it("reads the table as stored: inactive rows are skipped, a shop's row with a lower priority comes first, the shop's label is used", () => {
    const shopRow: DampingRule = { ...RULES[0], id: 900, symptom: 'bounces-after-bump', end: 'front', adjuster: 'mid-valve', direction: 'more', priority: 0, source: 'shop' };
    const adjusters = [clicks('rebound', 12), clicks('mid-valve', 6, 12)];
    const kinds = [{ key: 'mid-valve', label: 'MVB', circuit: 'compression' as const, speed: 'all' as const }];
    const first = nextChange(input({ adjusters, rules: [...RULES, shopRow], kinds }));
    expect(first.kind === 'change' && first.change.instruction).toBe('Front MVB: turn in (clockwise) 2 clicks, from 6 to 4 out from fully closed.');
    const inactive = nextChange(input({ adjusters, rules: [...RULES, { ...shopRow, active: false }] }));
    expect(inactive.kind === 'change' && inactive.change.adjuster).toBe('rebound');
  });
});

const KINDS = ['rebound', 'compression', 'hs-compression', 'ls-compression', 'hs-rebound', 'ls-rebound'] as const;

const arbitraryAdjuster = (kind: string) =>
  fc
    .record({ unit: fc.constantFrom('clicks' as const, 'turns' as const), rangeSteps: fc.integer({ min: 1, max: 40 }), at: fc.double({ min: 0, max: 1, noNaN: true }) })
    .map(({ unit, rangeSteps, at }): DamperAdjuster => {
      const step = DAMPER_STEP[unit];
      return { kind, unit, maxPosition: rangeSteps * step, standard: null, position: Math.round(at * rangeSteps) * step, dampingPerStepNsPerM: null };
    });

const arbitraryAdjusters = fc.subarray([...KINDS], { minLength: 2 }).chain((kinds) => fc.tuple(...kinds.map(arbitraryAdjuster)));

const arbitraryOutcome = fc.constantFrom<RideOutcome | null>('better', 'worse', 'same', null);

/** None, or earlier tries on the grid of either unit, so some of them coincide with what would be proposed. */
const arbitraryTries = fc.array(
  fc.record({
    ruleId: fc.constant(null),
    adjuster: fc.constantFrom(...KINDS),
    direction: fc.constantFrom<DampingDirection>('more', 'less'),
    from: fc.integer({ min: 0, max: 40 }).map((n) => n / 4),
    to: fc.integer({ min: 0, max: 40 }).map((n) => n / 4),
    outcome: arbitraryOutcome,
    undone: fc.boolean(),
  }),
  { minLength: 1, maxLength: 6 },
);
const arbitraryHistory = fc.oneof(fc.constant([]), arbitraryTries);

const arbitrarySizing = fc.option(
  fc.record({ recordId: fc.nat(), decision: fc.constantFrom<SizingHint['decision']>('keep', 'marginal', 'change', 'check', 'none'), headline: fc.constant('Keep the spring.') }),
);

describe('nextChange (fast-check)', () => {
  it('a proposal stays in range, on a whole step, moves, and never repeats a tried (adjuster, from, to), through a whole loop', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...SYMPTOM_KEYS).chain((key) => fc.tuple(fc.constant(key), fc.constantFrom(...symptomOf(key).ends))),
        arbitraryAdjusters,
        arbitraryHistory,
        arbitrarySizing,
        fc.array(fc.record({ strength: fc.constantFrom('slight' as const, 'clear' as const, 'strong' as const), outcome: fc.constantFrom<RideOutcome>('better', 'worse', 'same'), undo: fc.boolean() }), { minLength: 1, maxLength: 40 }),
        ([symptom, end], start, history, sizingHint, rides) => {
          let adjusters = start.map((adjuster) => ({ ...adjuster }));
          const triedSoFar: TriedChange[] = history.map((entry) => ({ ...entry, undone: entry.outcome === null ? true : entry.undone }));
          for (const ride of rides) {
            const answer = nextChange({ symptom, end, strength: ride.strength, adjusters, rules: RULES, tried: triedSoFar, sizing: sizingHint });
            if (answer.kind !== 'change') break;
            const { change } = answer;
            const adjuster = adjusters.find((candidate) => candidate.kind === change.adjuster)!;
            expect(adjuster).toBeDefined();
            expect(change.from).toBe(adjuster.position);
            expect(change.to).toBeGreaterThanOrEqual(0);
            expect(change.to).toBeLessThanOrEqual(adjuster.maxPosition);
            expect(isWholeStep(adjuster.unit, change.to)).toBe(true);
            expect(change.to).not.toBe(change.from);
            expect(Math.sign(change.delta)).toBe(change.direction === 'more' ? -1 : 1);
            expect(triedSoFar.some((t) => t.adjuster === change.adjuster && t.from === change.from && t.to === change.to)).toBe(false);
            const rule = RULES.find((candidate) => candidate.id === change.ruleId)!;
            expect([rule.symptom, rule.end, rule.adjuster, rule.direction]).toEqual([symptom, end, change.adjuster, change.direction]);
            // One change at a time: until it is judged, nothing else is proposed.
            const pending: TriedChange = { ruleId: change.ruleId, adjuster: change.adjuster, direction: change.direction, from: change.from, to: change.to, outcome: null, undone: false };
            expect(nextChange({ symptom, end, strength: ride.strength, adjusters, rules: RULES, tried: [...triedSoFar, pending], sizing: sizingHint }).kind).toBe('none');
            const undo = ride.outcome === 'worse' && ride.undo;
            triedSoFar.push({ ...pending, outcome: ride.outcome, undone: undo });
            if (!undo) adjusters = adjusters.map((candidate) => (candidate.kind === change.adjuster ? { ...candidate, position: change.to } : candidate));
          }
        },
      ),
      { numRuns: 400 },
    );
  });

  it('with all six kinds at mid-range and a spring the sizing keeps, every symptom gets a change at every end it applies to', () => {
    const adjusters = KINDS.map((kind) => clicks(kind, 10));
    for (const symptom of SYMPTOMS) {
      for (const end of symptom.ends) {
        expect(nextChange(input({ symptom: symptom.key, end, adjusters, sizing: sizing('keep') })).kind).toBe('change');
      }
    }
  });
});
