/**
 * The one decision per end (section 6, "The decision"): keep, keep but marginal, change, or check
 * before acting. It takes the end's figures, already worked out (the fitted spring judged at the
 * settings its adjuster can make, the readings' band, the candidates at theirs, the rate check) and
 * returns the steps in the order they are done and the reasons; every screen renders only this.
 */

import type {
  AdjusterUnit,
  CandidateResult,
  Certainty,
  DampingHint,
  DecisionKind,
  DecisionReason,
  DecisionStep,
  EndDecision,
  EndKind,
  PreloadAdvice,
  RangeMm,
  RemeasureItem,
  SettingStep,
  SizingMode,
  SpringName,
  SpringOffer,
  Verdict,
} from '../types/sizing';
import type { RankedCandidates } from './candidates';
import { describeDecision, SI_FORMAT } from './decision-text';
import type { BandAssessment } from './reading-band';
import type { SettableSetting } from './settable-setting';
import { isInsideWindow, type SagWindows } from './targets';

/**
 * Readings that disagree with the stated spring and the weights: the rate they imply, or, with a
 * topped-out static reading (no rate to imply), the total load the rider reading gives.
 */
export type ReadingMismatch =
  | { kind: 'rate'; impliedRateNmm: number; bandNmm: number | null; statedRateNmm: number }
  | { kind: 'load'; readingN: number; weighedN: number };

/** A spacer under the spring that lets the fitted spring's rate be set inside both windows. */
export interface SpacerOption {
  lengthMm: number;
  setting: SettableSetting;
}

export interface DecisionInput {
  end: EndKind;
  family: string;
  unit: AdjusterUnit;
  mode: SizingMode;
  /** The windows can be aimed at. */
  usable: boolean;
  windows: SagWindows;
  installed: SpringName;
  /** The fitted spring's rate over the sag range. */
  effectiveRateNmm: number;
  verdict: Verdict | null;
  /** Why a rate that suits cannot be set: the adjuster's range, its steps, or coil-bind. */
  adjusterCause: 'range' | 'steps' | 'coil-bind' | null;
  /** The windows-only aim for a rate that suits, and the preloads it may be set within. */
  neededPreloadMm: number | null;
  rangeMm: RangeMm;
  preload: PreloadAdvice | null;
  /** The fitted spring's setting, scored as the candidates are. */
  currentMissScore: number | null;
  idealRateNmm: number | null;
  mismatch: ReadingMismatch | null;
  frictionSuspect: boolean;
  band: BandAssessment | null;
  frictionBandMm: { static: number | null; rider: number | null } | null;
  /**
   * The static reading was topped out: the rider reading gave the change, and static sag after it
   * is only bounded. The bounds at the spacer's setting and at the pick's, for whichever is advised.
   */
  staticToppedOut: { riderSagMm: number; spacerMaxMm: number | null; pickMaxMm: number | null } | null;
  ranked: RankedCandidates;
  spacer: SpacerOption | null;
  marginalRatePct: number;
  /** Rates closer than this leave damping alone. */
  sameRatePct: number;
}

/** A candidate must beat the fitted spring's score by this much (half-windows) to be named the better option. */
const BETTER_BY = 0.1;

export function decideEnd(input: DecisionInput): EndDecision {
  const decision = decide(input);
  return { ...decision, text: describeDecision(decision, SI_FORMAT) };
}

type Decision = Omit<EndDecision, 'text'>;

function decide(input: DecisionInput): Decision {
  if (!input.usable || input.verdict === null) {
    return outcome(input, 'none', 'unsure', [], [{ code: 'targets-invalid' }], null, null);
  }
  if (input.mismatch) return decideCheck(input, input.mismatch);
  return input.verdict === 'keep' ? decideKeep(input) : decideChange(input);
}

function decideCheck(input: DecisionInput, mismatch: ReadingMismatch): Decision {
  const items: RemeasureItem[] = input.frictionSuspect
    ? ['friction', 'weights', 'geometry', 'spring-label', 'preload']
    : ['weights', 'geometry', 'spring-label', 'friction', 'preload'];
  return outcome(
    input,
    'check',
    'unsure',
    [{ kind: 'remeasure', end: input.end, items }],
    [
      mismatch.kind === 'rate'
        ? { code: 'rate-mismatch', impliedRateNmm: mismatch.impliedRateNmm, bandNmm: mismatch.bandNmm, statedRateNmm: mismatch.statedRateNmm }
        : { code: 'load-mismatch', readingN: mismatch.readingN, weighedN: mismatch.weighedN },
    ],
    null,
    null,
  );
}

function decideKeep(input: DecisionInput): Decision {
  const preload = input.preload!;
  const steps: DecisionStep[] = [];
  if (preload.direction !== 'none') steps.push({ kind: 'preload', interim: false, spring: input.installed, setting: settingOf(input.unit, preload) });
  const reasons: DecisionReason[] = [];
  if (preload.riderSagAfterMm !== null && preload.staticSagAfterMm !== null) {
    reasons.push({
      code: 'inside-windows',
      riderSagMm: preload.riderSagAfterMm,
      staticSagMm: preload.staticSagAfterMm,
      rider: input.windows.riderSagMm,
      static: input.windows.staticSagMm,
    });
  }
  const marginal = findMarginalReasons(input, preload);
  appendToppedOut(input, preload.staticSagAfterMaxMm, steps, reasons);
  if (marginal.length === 0) return outcome(input, 'keep', baseCertainty(input), steps, reasons, null, null);

  const better = findBetter(input);
  const orderRateNmm = !better.best && marginal.some((r) => r.code === 'rate-off-ideal') ? input.idealRateNmm : null;
  if (better.best || orderRateNmm !== null) {
    steps.push({ kind: 'consider-spring', better: better.best && offerOf(better.best), inStock: better.inStock && offerOf(better.inStock), orderRateNmm });
  }
  const pickCandidate = better.inStock ?? better.best;
  const pick = pickCandidate ? offerOf(pickCandidate) : null;
  return outcome(input, 'marginal', 'marginal', steps, [...marginal, ...reasons], pick, pick ? dampingFor(input, pickCandidate!, true) : null);
}

function decideChange(input: DecisionInput): Decision {
  const steps: DecisionStep[] = [];
  const reasons: DecisionReason[] = [];
  const preload = input.preload;
  if (preload && preload.direction !== 'none') {
    steps.push({ kind: 'preload', interim: true, spring: input.installed, setting: settingOf(input.unit, preload) });
  }
  if (input.verdict === 'too-soft' || input.verdict === 'too-stiff') {
    reasons.push({ code: input.verdict, installed: input.installed, idealRateNmm: input.idealRateNmm });
  } else if (input.adjusterCause && input.neededPreloadMm !== null) {
    reasons.push({ code: 'adjuster-limit', cause: input.adjusterCause, neededMm: input.neededPreloadMm, rangeMm: input.rangeMm });
  }
  if (input.band?.crosses) reasons.push(bandReason(input.band));

  const { inStock, best, closestInStock } = input.ranked;
  const pickCandidate = inStock ?? best;
  let pick: SpringOffer | null = null;
  // A spacer is the cheaper fix where the rate suits and only the adjuster falls short.
  const bounds = input.staticToppedOut;
  let staticMaxMm = preload?.staticSagAfterMaxMm ?? null;
  if (input.spacer) {
    staticMaxMm = bounds?.spacerMaxMm ?? null;
    steps.push({ kind: 'spacer', lengthMm: input.spacer.lengthMm, setting: settingFromSettable(input.unit, input.spacer.setting, staticMaxMm) });
  } else if (pickCandidate) {
    pick = offerOf(pickCandidate);
    staticMaxMm = bounds?.pickMaxMm ?? null;
    steps.push({ kind: 'fit-spring', spring: pick, setting: candidateSetting(input.unit, pickCandidate, staticMaxMm) });
  } else {
    steps.push({ kind: 'order-spring', rateNmm: input.idealRateNmm, family: input.family });
    reasons.push({ code: 'none-in-catalogue', family: input.family });
  }
  if (!inStock && closestInStock && closestInStock !== pickCandidate) {
    reasons.push({
      code: 'shelf-short',
      spring: offerOf(closestInStock),
      riderSagMm: closestInStock.riderSagMm,
      staticSagMm: closestInStock.staticSagMm,
      rider: input.windows.riderSagMm,
      static: input.windows.staticSagMm,
    });
  }
  appendToppedOut(input, staticMaxMm, steps, reasons);
  const certainty = input.band?.crosses ? 'marginal' : baseCertainty(input);
  return outcome(input, 'change', certainty, steps, reasons, pick, pickCandidate && pick ? dampingFor(input, pickCandidate, false) : null);
}

/** Why a keep is only marginal: the readings' band, the rate's distance from the ideal, a sag on its window's edge. */
function findMarginalReasons(input: DecisionInput, preload: PreloadAdvice): DecisionReason[] {
  const reasons: DecisionReason[] = [];
  if (input.band?.crosses) reasons.push(bandReason(input.band));
  const ideal = input.idealRateNmm;
  if (ideal !== null && ideal > 0) {
    const offPct = ((input.effectiveRateNmm - ideal) / ideal) * 100;
    if (Math.abs(offPct) > input.marginalRatePct) {
      reasons.push({ code: 'rate-off-ideal', installed: input.installed, effectiveRateNmm: input.effectiveRateNmm, idealRateNmm: ideal, offPct });
    }
  }
  const bands = input.frictionBandMm;
  if (bands) {
    const edges: ['rider' | 'static', number | null, number | null, RangeMm][] = [
      ['rider', preload.riderSagAfterMm, bands.rider, input.windows.riderSagMm],
      ['static', preload.staticSagAfterMm, bands.static, input.windows.staticSagMm],
    ];
    for (const [which, sagMm, bandMm, window] of edges) {
      if (sagMm === null || !bandMm) continue;
      if (!isInsideWindow(sagMm - bandMm, window) || !isInsideWindow(sagMm + bandMm, window)) {
        reasons.push({ code: 'near-window-edge', which, sagMm, bandMm, window });
      }
    }
  }
  return reasons;
}

function bandReason(band: BandAssessment): DecisionReason {
  const difference = band.sagDifference;
  return {
    code: 'band-crosses-limit',
    differenceMm: difference.mm,
    bandMm: difference.bandMm ?? 0,
    limitMm: band.crosses === 'soft' ? difference.softLimitMm : difference.stiffLimitMm,
    side: band.crosses ?? 'soft',
  };
}

/** Fits that beat the fitted spring: nearer the middles, and nearer the ideal rate where it is known. */
function findBetter(input: DecisionInput): { best: CandidateResult | null; inStock: CandidateResult | null } {
  let best: CandidateResult | null = null;
  let inStock: CandidateResult | null = null;
  for (const c of input.ranked.candidates) {
    if (!c.feasible || !beats(c, input)) continue;
    best ??= c;
    if (c.inStock) inStock ??= c;
  }
  return { best, inStock };
}

function beats(c: CandidateResult, input: DecisionInput): boolean {
  if (c.rateNmm === input.installed.rateNmm && c.secondRateNmm === input.installed.secondRateNmm) return false;
  const ideal = input.idealRateNmm;
  if (ideal !== null && Math.abs(c.rateNmm - ideal) >= Math.abs(input.effectiveRateNmm - ideal)) return false;
  return input.currentMissScore === null || c.missScore === null || c.missScore < input.currentMissScore - BETTER_BY;
}

/** After a topped-out static reading: say so, and measure static sag again at the setting advised last. */
function appendToppedOut(input: DecisionInput, staticMaxMm: number | null, steps: DecisionStep[], reasons: DecisionReason[]): void {
  if (!input.staticToppedOut) return;
  reasons.push({ code: 'static-topped-out', riderSagMm: input.staticToppedOut.riderSagMm });
  steps.push({ kind: 'measure-static', staticSagMaxMm: staticMaxMm });
}

function baseCertainty(input: DecisionInput): Certainty {
  if (input.staticToppedOut) return 'bounded';
  return input.mode === 'weights' ? 'estimate' : 'measured';
}

/** A stiffer spring lowers the damping ratio with the same damper, so start with more rebound damping; a softer one, less (5h). */
function dampingFor(input: DecisionInput, spring: CandidateResult, conditional: boolean): DampingHint {
  const change = (spring.rateNmm / input.effectiveRateNmm - 1) * 100;
  const direction = change > input.sameRatePct ? 'more' : change < -input.sameRatePct ? 'less' : 'same';
  return { direction, spring: { rateNmm: spring.rateNmm, secondRateNmm: spring.secondRateNmm }, conditional };
}

export function offerOf(c: CandidateResult): SpringOffer {
  return { sku: c.sku, family: c.family, rateNmm: c.rateNmm, secondRateNmm: c.secondRateNmm, inStock: c.inStock, available: c.available };
}

function settingOf(unit: AdjusterUnit, preload: PreloadAdvice): SettingStep {
  return settingStep(unit, preload.roundedChangeUnits, preload.position, preload.riderSagAfterMm, preload.staticSagAfterMm, preload.staticSagAfterMaxMm);
}

function settingFromSettable(unit: AdjusterUnit, setting: SettableSetting, staticSagMaxMm: number | null): SettingStep {
  return settingStep(unit, setting.changeUnits, setting.position, setting.riderSagMm, setting.staticSagMm, staticSagMaxMm);
}

function candidateSetting(unit: AdjusterUnit, c: CandidateResult, staticSagMaxMm: number | null): SettingStep {
  return settingStep(unit, c.preloadUnits ?? 0, c.position ?? 0, c.riderSagMm, c.staticSagMm, staticSagMaxMm);
}

function settingStep(
  unit: AdjusterUnit,
  changeUnits: number,
  position: number,
  riderSagMm: number | null,
  staticSagMm: number | null,
  staticSagMaxMm: number | null,
): SettingStep {
  return { unit, changeUnits, position, riderSagMm, staticSagMm, staticSagMaxMm };
}

function outcome(
  input: DecisionInput,
  kind: DecisionKind,
  certainty: Certainty,
  steps: DecisionStep[],
  reasons: DecisionReason[],
  pick: SpringOffer | null,
  dampingHint: DampingHint | null,
): Decision {
  return { kind, certainty, installed: input.installed, steps, reasons, pick, dampingHint };
}
