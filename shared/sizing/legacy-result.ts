/**
 * Results stored by engines before 2.0.0 answered with a verdict sentence, not a decision. They
 * are shown as they were made: the headline is the sentence that engine wrote, the kind follows
 * its verdict, the spring it put forward stays the one a quote is built on, and nothing it did not
 * work out (steps, reasons, load cases) is made up for it.
 */

import type { DecisionKind, EndResult, SizingResult, Verdict } from '../types/sizing';
import { offerOf } from './decide-end';

type StoredEnd = Omit<EndResult, 'decision' | 'rideFrequencyHz'> &
  Partial<Pick<EndResult, 'decision'>> & { rideFrequencyHz: { current: number | null; after?: number | null; recommended?: number | null; note: string } };

const KIND_OF: Record<Verdict, DecisionKind> = {
  keep: 'keep',
  'too-soft': 'change',
  'too-stiff': 'change',
  'preload-out-of-range': 'change',
};

export function upgradeLegacyResult(result: SizingResult): SizingResult {
  if (!isLegacyEnd(result.front) && !isLegacyEnd(result.rear)) return result;
  const upgraded: SizingResult = { ...result };
  if (result.front) upgraded.front = upgradeEnd(result.front as StoredEnd, result.engineVersion);
  if (result.rear) upgraded.rear = upgradeEnd(result.rear as StoredEnd, result.engineVersion);
  return upgraded;
}

function isLegacyEnd(end: EndResult | undefined): boolean {
  return end !== undefined && !end.decision;
}

function upgradeEnd(end: StoredEnd, engineVersion: string): EndResult {
  if (end.decision) return end as EndResult;
  // Those engines put forward their best spring in stock, else the best to order, wherever the verdict was not keep.
  const offered = end.verdict !== null && end.verdict !== 'keep' ? (end.recommendation.inStock ?? end.recommendation.best) : null;
  const note = `Worked out by engine ${engineVersion}, which gave a verdict without steps; measure again for advice in steps.`;
  return {
    ...end,
    sagDifference: end.sagDifference ?? null,
    idealRateBandNmm: end.idealRateBandNmm ?? null,
    installedSpring: end.installedSpring ?? { rateNmm: end.installedRateNmm, secondRateNmm: null },
    loads: { ...end.loads, staticMaxN: end.loads.staticMaxN ?? null },
    recommendation: { ...end.recommendation, closestInStock: end.recommendation.closestInStock ?? null },
    loadCases: end.loadCases ?? [],
    rideFrequencyHz: { current: end.rideFrequencyHz.current, after: end.rideFrequencyHz.after ?? end.rideFrequencyHz.recommended ?? null, note: end.rideFrequencyHz.note },
    decision: {
      kind: end.verdict === null ? 'none' : KIND_OF[end.verdict],
      certainty: end.mode === 'weights' ? 'estimate' : 'measured',
      installed: { rateNmm: end.installedRateNmm, secondRateNmm: null },
      steps: [],
      reasons: [],
      pick: offered ? offerOf(offered) : null,
      dampingHint: null,
      text: { headline: end.verdictText, steps: [], reasons: [note], certainty: note, damping: null },
      legacy: true,
    },
  };
}
