/**
 * Plans back to the standard, back to the baseline, and undoing one change. The check values are
 * the adjusters' own positions (no published figures are involved); the instructions are read back
 * into numbers here, independently of how the module words them.
 */
import * as fc from 'fast-check';
import { applyPlan, planToBaseline, planToStandard, planUndo } from '@shared/damping';
import { DAMPER_STEP, type DamperAdjuster, type DamperUnit } from '@shared/types/damping';

const KINDS = ['rebound', 'compression', 'hs-compression', 'ls-compression', 'hs-rebound', 'ls-rebound'] as const;

function clicks(kind: string, position: number, standard: number | null, maxPosition = 20): DamperAdjuster {
  return { kind, unit: 'clicks', maxPosition, standard, position, dampingPerStepNsPerM: null };
}

function turns(kind: string, position: number, standard: number | null, maxPosition = 3): DamperAdjuster {
  return { kind, unit: 'turns', maxPosition, standard, position, dampingPerStepNsPerM: null };
}

const WORDS: Record<string, number> = { 'a quarter turn': 0.25, 'a half turn': 0.5, 'three quarters of a turn': 0.75 };

/** "12 clicks", "1.5 turns", "a half turn" -> the number and unit a person would read. */
function readAmount(text: string): { amount: number; unit: DamperUnit } {
  if (WORDS[text] !== undefined) return { amount: WORDS[text], unit: 'turns' };
  const match = /^(\d+(?:\.\d+)?) (click|clicks|turn|turns)$/.exec(text);
  if (!match) throw new Error(`Not an amount: ${text}`);
  return { amount: Number(match[1]), unit: match[2].startsWith('click') ? 'clicks' : 'turns' };
}

/** The position an absolute instruction leads to, read from its words. */
function readAbsolute(instruction: string, unit: DamperUnit): number {
  if (/: turn in \(clockwise\) until it stops \(fully closed\)\.$/.test(instruction)) return 0;
  const match = /: turn in \(clockwise\) until it stops, then out (.+)\.$/.exec(instruction);
  if (!match) throw new Error(`Not an absolute instruction: ${instruction}`);
  const read = readAmount(match[1]);
  expect(read.unit).toBe(unit);
  return read.amount;
}

/** The position a relative instruction leads to, from where the adjuster is. */
function readRelative(instruction: string, unit: DamperUnit, position: number): number {
  const match = /: turn (in \(clockwise\)|out \(counter-clockwise\)) (.+), back to (\d+(?:\.\d+)?) out from fully closed\.$/.exec(instruction);
  if (!match) throw new Error(`Not a relative instruction: ${instruction}`);
  const read = readAmount(match[2]);
  expect(read.unit).toBe(unit);
  const to = match[1].startsWith('in') ? position - read.amount : position + read.amount;
  expect(to).toBeCloseTo(Number(match[3]), 9);
  return to;
}

describe('plans: worked examples', () => {
  it('to the standard: from the closed stop, whatever the current position', () => {
    const plan = planToStandard('front', [clicks('rebound', 11, 12), turns('compression', 2, 1.5), clicks('hs-compression', 4, null), turns('ls-rebound', 1, 0.5)]);
    expect(plan.steps.map((step) => step.instruction)).toEqual([
      'Front rebound: turn in (clockwise) until it stops, then out 12 clicks.',
      'Front compression: turn in (clockwise) until it stops, then out 1.5 turns.',
      'Front low-speed rebound: turn in (clockwise) until it stops, then out a half turn.',
    ]);
    expect(plan.missing).toEqual(['Front high-speed compression: no standard setting is known.']);
    expect(plan.atTarget).toBe(false);
  });

  it('a standard of 0 is the closed stop itself', () => {
    expect(planToStandard('rear', [clicks('rebound', 3, 0)]).steps[0].instruction).toBe('Rear rebound: turn in (clockwise) until it stops (fully closed).');
  });

  it('already at the standard: no step, at target; nothing settable is not "at target"', () => {
    expect(planToStandard('rear', [clicks('rebound', 12, 12), clicks('compression', 3, null)])).toEqual({ end: 'rear', steps: [], missing: ['Rear compression: no standard setting is known.'], atTarget: true });
    expect(planToStandard('rear', [clicks('compression', 3, null)]).atTarget).toBe(false);
  });

  it('to the baseline: missing where the baseline has no position or one the adjuster cannot take', () => {
    const plan = planToBaseline('rear', [clicks('rebound', 8, 12), clicks('compression', 10, 10, 16), clicks('hs-compression', 2, null)], { rebound: 14, compression: 18 });
    expect(plan.steps.map((step) => step.instruction)).toEqual(['Rear rebound: turn in (clockwise) until it stops, then out 14 clicks.']);
    expect(plan.missing).toEqual([
      'Rear compression: the baseline setting, 18, cannot be set on this adjuster. The setting must be from 0 (fully closed) to 16 clicks out (fully open).',
      'Rear high-speed compression: no baseline setting is known.',
    ]);
  });

  it('undo: relative, from where the adjuster is now back to where the change started', () => {
    const undo = planUndo('front', clicks('rebound', 10, 12), { from: 12, to: 10 });
    expect(undo.steps.map((step) => step.instruction)).toEqual(['Front rebound: turn out (counter-clockwise) 2 clicks, back to 12 out from fully closed.']);
    // Moved one more click since: the plan goes from the current position.
    expect(planUndo('front', clicks('rebound', 9, 12), { from: 12, to: 10 }).steps[0].instruction).toBe('Front rebound: turn out (counter-clockwise) 3 clicks, back to 12 out from fully closed.');
    expect(planUndo('rear', turns('compression', 1.5, null), { from: 1, to: 1.5 }).steps[0].instruction).toBe('Rear compression: turn in (clockwise) a half turn, back to 1 out from fully closed.');
    expect(planUndo('front', clicks('rebound', 12, 12), { from: 12, to: 10 })).toEqual({ end: 'front', steps: [], missing: [], atTarget: true });
  });

  it('undo to a position the adjuster no longer has: missing, no step', () => {
    const undo = planUndo('front', clicks('rebound', 10, 12, 14), { from: 16, to: 14 });
    expect(undo.steps).toEqual([]);
    expect(undo.missing[0]).toMatch(/^Front rebound: 16 cannot be set on this adjuster any more/);
  });
});

const arbitraryAdjuster = (kind: string) =>
  fc
    .record({
      unit: fc.constantFrom<DamperUnit>('clicks', 'turns'),
      rangeSteps: fc.integer({ min: 1, max: 40 }),
      at: fc.double({ min: 0, max: 1, noNaN: true }),
      standardAt: fc.option(fc.double({ min: 0, max: 1, noNaN: true })),
      baselineAt: fc.option(fc.double({ min: 0, max: 1, noNaN: true })),
      changeAt: fc.double({ min: 0, max: 1, noNaN: true }),
    })
    .map(({ unit, rangeSteps, at, standardAt, baselineAt, changeAt }) => {
      const step = DAMPER_STEP[unit];
      const onGrid = (share: number) => Math.round(share * rangeSteps) * step;
      const adjuster: DamperAdjuster = {
        kind,
        unit,
        maxPosition: rangeSteps * step,
        standard: standardAt === null ? null : onGrid(standardAt),
        position: onGrid(at),
        dampingPerStepNsPerM: null,
      };
      return { adjuster, baseline: baselineAt === null ? null : onGrid(baselineAt), changeFrom: onGrid(changeAt) };
    });

const arbitraryEnd = fc.subarray([...KINDS], { minLength: 1 }).chain((kinds) => fc.tuple(...kinds.map(arbitraryAdjuster)));

describe('plans (fast-check)', () => {
  it('to the standard: every adjuster with one ends at it, by the instruction too; the others are untouched', () => {
    fc.assert(
      fc.property(arbitraryEnd, (generated) => {
        const adjusters = generated.map((g) => g.adjuster);
        const plan = planToStandard('front', adjusters);
        const after = applyPlan(adjusters, plan);
        adjusters.forEach((adjuster, i) => {
          expect(after[i].position).toBe(adjuster.standard ?? adjuster.position);
          const step = plan.steps.find((candidate) => candidate.adjuster === adjuster.kind);
          if (step) expect(readAbsolute(step.instruction, adjuster.unit)).toBe(adjuster.standard);
          else expect(adjuster.standard === null || adjuster.standard === adjuster.position).toBe(true);
        });
        expect(plan.missing).toHaveLength(adjusters.filter((adjuster) => adjuster.standard === null).length);
        expect(plan.atTarget).toBe(adjusters.some((a) => a.standard !== null) && adjusters.every((a) => a.standard === null || a.standard === a.position));
      }),
      { numRuns: 500 },
    );
  });

  it('to the baseline: every adjuster in it ends at its position; the others are untouched and listed', () => {
    fc.assert(
      fc.property(arbitraryEnd, (generated) => {
        const adjusters = generated.map((g) => g.adjuster);
        const baseline = Object.fromEntries(generated.filter((g) => g.baseline !== null).map((g) => [g.adjuster.kind, g.baseline as number]));
        const plan = planToBaseline('rear', adjusters, baseline);
        const after = applyPlan(adjusters, plan);
        adjusters.forEach((adjuster, i) => {
          expect(after[i].position).toBe(baseline[adjuster.kind] ?? adjuster.position);
          const step = plan.steps.find((candidate) => candidate.adjuster === adjuster.kind);
          if (step) expect(readAbsolute(step.instruction, adjuster.unit)).toBe(baseline[adjuster.kind]);
        });
        expect(plan.missing).toHaveLength(adjusters.filter((adjuster) => !(adjuster.kind in baseline)).length);
      }),
      { numRuns: 500 },
    );
  });

  it('undo: the adjuster returns to the change\'s from, by the instruction too, and nothing else moves', () => {
    fc.assert(
      fc.property(arbitraryEnd, fc.nat(), (generated, pick) => {
        const adjusters = generated.map((g) => g.adjuster);
        const chosen = generated[pick % generated.length];
        const plan = planUndo('front', chosen.adjuster, { from: chosen.changeFrom, to: chosen.adjuster.position });
        const after = applyPlan(adjusters, plan);
        adjusters.forEach((adjuster, i) => expect(after[i].position).toBe(adjuster === chosen.adjuster ? chosen.changeFrom : adjuster.position));
        expect(plan.steps.length).toBe(chosen.changeFrom === chosen.adjuster.position ? 0 : 1);
        if (plan.steps.length === 1) expect(readRelative(plan.steps[0].instruction, chosen.adjuster.unit, chosen.adjuster.position)).toBeCloseTo(chosen.changeFrom, 9);
      }),
      { numRuns: 500 },
    );
  });
});
