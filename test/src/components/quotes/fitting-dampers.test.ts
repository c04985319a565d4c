/**
 * The fitting sheet's two stages for the damping adjusters: the server's plan to the maker's
 * standard, then from there back to the rider's baseline, so an adjuster at its baseline now is
 * still set back after the first stage moved it. Invented bike: fork rebound 12 of 20 clicks
 * (standard 10) and compression 8 of 20 (standard 8); shock rebound 1.5 of 3 turns (standard not
 * known). The plans are the shared engine's (shared/damping/plans.ts), as the server makes them.
 */
import { fittingDampers } from '@/components/quotes/fitting-dampers';
import { planToBaseline, planToStandard } from '@shared/damping';
import type { DamperAdjuster } from '@shared/types/damping';
import type { SetupSettings } from '@shared/types/setup-log';
import type { DamperPlans } from '@shared/types/test-ride';

const adjuster = (kind: string, unit: 'clicks' | 'turns', maxPosition: number, standard: number | null, position: number): DamperAdjuster => ({
  kind,
  unit,
  maxPosition,
  standard,
  position,
  dampingPerStepNsPerM: null,
});

const FRONT = [adjuster('rebound', 'clicks', 20, 10, 12), adjuster('compression', 'clicks', 20, 8, 8)];
const REAR = [adjuster('rebound', 'turns', 3, null, 1.5)];
const BIKE = { front: { dampers: FRONT }, rear: { dampers: REAR } } as unknown as Parameters<typeof fittingDampers>[0];

const spring = { rateNmm: 9, secondRateNmm: null, breakMm: null, family: 'F43', preloadMm: 10, preloadPosition: 2 };

/** The rider's baseline: fork rebound 12 (where it is now), compression 6; shock rebound 1.25 turns. */
const BASELINE: SetupSettings = {
  front: { ...spring, dampers: { rebound: 12, compression: 6 } },
  rear: { ...spring, dampers: { rebound: 1.25 } },
};

/** What GET /api/bikes/:id/damper-plans answers for the bike and baseline: each plan counted from the settings now. */
const PLANS: DamperPlans = {
  front: { standard: planToStandard('front', FRONT), baseline: planToBaseline('front', FRONT, BASELINE.front!.dampers) },
  rear: { standard: planToStandard('rear', REAR), baseline: planToBaseline('rear', REAR, BASELINE.rear!.dampers) },
  baselineText: 'The baseline is the settings before the first setup-log entry (2026-11-20).',
};

describe('fittingDampers', () => {
  const [front, rear] = fittingDampers(BIKE, PLANS, BASELINE);

  it('takes the first stage from the server’s plan to the maker’s standard', () => {
    expect(front.toStandard).toBe(PLANS.front!.standard);
    expect(front.toStandard.steps.map((step) => step.instruction)).toEqual(['Front rebound: turn in (clockwise) until it stops, then out 10 clicks.']);
  });

  it('sets back, in the second stage, an adjuster the first moved even though it is at its baseline now', () => {
    // The server's baseline plan has no rebound step: rebound is at 12, its baseline, now.
    expect(PLANS.front!.baseline.steps.map((step) => step.adjuster)).toEqual(['compression']);
    expect(front.toBaseline.steps.map((step) => [step.adjuster, step.from, step.to])).toEqual([
      ['rebound', 10, 12],
      ['compression', 8, 6],
    ]);
    expect(front.toBaseline.steps.map((step) => step.instruction)).toEqual([
      'Front rebound: turn in (clockwise) until it stops, then out 12 clicks.',
      'Front compression: turn in (clockwise) until it stops, then out 6 clicks.',
    ]);
  });

  it('names the adjusters a stage leaves because they are there already', () => {
    expect(front.atStandard).toEqual(['Front compression at 8 clicks out']);
    expect(front.atBaseline).toEqual([]);
    expect(rear.atStandard).toEqual([]);
  });

  it('keeps an adjuster without a known standard where it is for the first stage and names it', () => {
    expect(rear.toStandard.steps).toEqual([]);
    expect(rear.toStandard.missing).toEqual(['Rear rebound: no standard setting is known.']);
    expect(rear.toBaseline.steps.map((step) => step.instruction)).toEqual(['Rear rebound: turn in (clockwise) until it stops, then out 1.25 turns.']);
  });

  it('counts the baseline from the settings now while the log is empty', () => {
    const [emptyLogFront] = fittingDampers(BIKE, PLANS, null);
    expect(emptyLogFront.toBaseline.steps.map((step) => [step.adjuster, step.to])).toEqual([['rebound', 12]]);
  });

  it('leaves out an end without damping adjusters', () => {
    expect(fittingDampers({ front: BIKE.front, rear: null } as typeof BIKE, { ...PLANS, rear: null }, BASELINE).map((end) => end.end)).toEqual(['front']);
  });
});
