/**
 * The damping adjusters on a fitting sheet: each end first to the maker's standard, then to the
 * rider's baseline. The first stage is the server's standard plan (GET /api/bikes/:id/damper-plans).
 * The second cannot be its baseline plan as it stands, which counts from the settings now: an
 * adjuster at its baseline now has no step there, yet after the first stage it sits at the
 * standard and must be set back. So the second stage is worked out by the same shared engine from
 * where the first one leaves each adjuster, towards the baseline the server's plan uses (the
 * settings before the setup log's first entry, or the settings now while the log is empty).
 */
import { tidyPosition } from '@shared/damping/adjuster-range';
import { applyPlan, planToBaseline } from '@shared/damping/plans';
import { describeAdjusterAt } from '@shared/damping/symptoms';
import type { BikeSpec } from '@shared/types/bike';
import type { DamperAdjuster, DamperKind, DamperPlan } from '@shared/types/damping';
import type { SetupSettings } from '@shared/types/setup-log';
import type { EndKind } from '@shared/types/sizing';
import type { DamperPlans } from '@shared/types/test-ride';

import { describeSetting } from '../test-ride/ride-words';

export interface FittingEndDampers {
  end: EndKind;
  /** Stage 1: from the settings now to the maker's standard. */
  toStandard: DamperPlan;
  /** Stage 2: from where stage 1 leaves the adjusters to the rider's baseline. */
  toBaseline: DamperPlan;
  /** The adjusters each stage leaves as they are, being there already: "Rear compression at 10 clicks out". */
  atStandard: string[];
  atBaseline: string[];
}

const ENDS: readonly EndKind[] = ['front', 'rear'];

/** The baseline of one end's adjusters, by kind, as the server's baseline plan takes it. */
function baselineOf(bike: Pick<BikeSpec, 'front' | 'rear'>, end: EndKind, baseline: SetupSettings | null): Record<string, number> {
  if (baseline) return baseline[end]?.dampers ?? {};
  return Object.fromEntries((bike[end]?.dampers ?? []).map((damper) => [damper.kind, damper.position]));
}

/** Adjusters the plan has no step for whose setting is its target: the sheet names them, so none looks forgotten. */
function alreadyThere(
  end: EndKind,
  adjusters: readonly DamperAdjuster[],
  plan: DamperPlan,
  targetOf: (adjuster: DamperAdjuster) => number | undefined,
  kinds?: readonly DamperKind[],
): string[] {
  return adjusters
    .filter((adjuster) => {
      const target = targetOf(adjuster);
      return target !== undefined && tidyPosition(target) === tidyPosition(adjuster.position) && !plan.steps.some((step) => step.adjuster === adjuster.kind);
    })
    .map((adjuster) => `${describeAdjusterAt(end, adjuster.kind, kinds)} at ${describeSetting(adjuster.unit, adjuster.position)}`);
}

/** Both stages for each end that has damping adjusters, fork first. */
export function fittingDampers(
  bike: Pick<BikeSpec, 'front' | 'rear'>,
  plans: DamperPlans,
  baseline: SetupSettings | null,
  kinds?: readonly DamperKind[],
): FittingEndDampers[] {
  return ENDS.flatMap((end) => {
    const endPlans = plans[end];
    const dampers = bike[end]?.dampers ?? [];
    if (!endPlans || dampers.length === 0) return [];
    const afterStandard = applyPlan(dampers, endPlans.standard);
    const baselineSettings = baselineOf(bike, end, baseline);
    const toBaseline = planToBaseline(end, afterStandard, baselineSettings, kinds);
    return [
      {
        end,
        toStandard: endPlans.standard,
        toBaseline,
        atStandard: alreadyThere(end, dampers, endPlans.standard, (adjuster) => adjuster.standard ?? undefined, kinds),
        atBaseline: alreadyThere(end, afterStandard, toBaseline, (adjuster) => (Object.hasOwn(baselineSettings, adjuster.kind) ? baselineSettings[adjuster.kind] : undefined), kinds),
      },
    ];
  });
}
