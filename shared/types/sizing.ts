/**
 * Request, context and result of the sizing engine (shared/sizing).
 * SI throughout: mm, kg, N, N/mm, s; shares are fractions (0.5), windows are % of travel.
 */

export type EndKind = 'front' | 'rear';

/** One loaded reading: a single length, or the pushed-down and lifted pair that is averaged. */
export type LengthReading = number | { pushedMm: number; liftedMm: number };

export interface Readings {
  /** L0: wheel off the ground, fully extended. */
  extendedMm: number;
  /** L1: on its wheels, no rider. */
  staticMm: LengthReading;
  /** L2: rider aboard in riding position. */
  riderMm: LengthReading;
}

export type AdjusterKind = 'threaded' | 'stepped' | 'spacer';

export interface Adjuster {
  kind: AdjusterKind;
  /** Preload mm per turn (thread pitch), per step, or per mm of spacer (normally 1). */
  mmPerUnit: number;
  /** Current setting counted from the adjuster's zero (turns, steps or spacer mm). */
  position: number;
  maxPosition: number;
  /** Defaults to 0. */
  minPosition?: number;
}

export interface EndTarget {
  riderSagMm: number;
  staticSagMm: number;
}

interface EndCommonRequest {
  rateNmm: number;
  /** The fitted spring's deflection at coil-bind, when known; else a catalogue spring of the same fit and rate stands in. */
  maxDeflectionMm?: number;
  /** Dual-rate spring: the rate above breakMm of spring compression. */
  secondRateNmm?: number | null;
  breakMm?: number | null;
  /** Spring compression at full extension (mm). */
  preloadMm: number;
  family: string;
  /** Only coil springs are sized; the schema refuses 'air'. */
  springType?: 'coil';
  adjuster: Adjuster;
  readings?: Readings;
  target?: EndTarget;
}

export interface FrontRequest extends EndCommonRequest {
  /** Along the fork axis. */
  travelMm: number;
  springCount: 1 | 2;
  rakeDeg: number;
}

/** [wheel travel mm, shock compression mm]. */
export type LinkagePoint = [number, number];

export interface RearRequest extends EndCommonRequest {
  wheelTravelMm: number;
  shockStrokeMm: number;
  gasForceN?: number;
  linkage?: LinkagePoint[];
}

export interface BikeMasses {
  /** Wet mass, as ridden. */
  massKg: number;
  frontShare: number;
  unsprungFrontKg: number;
  unsprungRearKg: number;
}

/** The solo rider: what chooses the spring. */
export interface RiderMasses {
  bodyKg: number;
  gearKg: number;
  rearShare: number;
}

/** A passenger or luggage carried now and then: it adds preload on the spring the solo sizing chose. */
export interface LoadCaseRequest {
  name: string;
  massKg: number;
  /** Share of its weight on the rear wheel; above 1 for a top box behind the axle. */
  rearShare?: number;
}

export interface SizingRequest {
  discipline: string;
  bike: BikeMasses;
  rider: RiderMasses;
  front?: FrontRequest;
  rear?: RearRequest;
  loadCases?: LoadCaseRequest[];
  /** Assumed ride damping ratio for the preview. */
  dampingRatio?: number;
}

export type Window = [number, number];

export interface EndWindowsPct {
  riderSagPct: Window;
  staticSagPct: Window;
}

export interface TargetProfile {
  discipline: string;
  label: string;
  front: EndWindowsPct;
  rear: EndWindowsPct;
  note: string;
}

export interface CatalogueSpring {
  sku: string;
  kind: 'fork' | 'shock';
  family: string;
  rateNmm: number;
  secondRateNmm?: number | null;
  breakMm?: number | null;
  freeLengthMm: number;
  maxDeflectionMm: number;
  onHand: number;
  reserved: number;
}

/** The shop's editable sizing settings: warning thresholds and the typical values assumed when unknown. */
export interface WarningThresholds {
  /** Full spread between pushed and lifted readings above which friction is suspect. */
  frictionSpreadMm: { front: number; rear: number };
  impliedRateMismatchPct: number;
  /** Calibrated against weighed static load, in %, before a warning. */
  staticLoadMismatchPct: number;
  /** A fitted rate this far off the ideal, in %, makes a keep marginal. */
  marginalRatePct: number;
  /** Smallest preload that keeps a spring captive. */
  minCaptivePreloadMm: number;
  /** Spring deflection to keep clear of coil-bind at full travel. */
  coilBindMarginMm: number;
  /** Smallest change a person sets: turns, steps, spacer mm. */
  adjusterResolution: Record<AdjusterKind, number>;
  /** A predicted static sag below this is unreliable (top-out springs). */
  smallStaticSagMm: number;
  /** Rates closer than this give the rebound hint 'same'. */
  sameRatePct: number;
  /** Assumed for a load case that leaves it out. */
  luggageRearShare: number;
  dampingRatio: number;
  /** Intake figures outside these are flagged as implausible. */
  plausible: {
    bikeKg: Window;
    riderBodyKg: Window;
    gearKg: Window;
    luggageKg: Window;
    unsprungKg: Window;
    frontShare: Window;
    riderRearShare: Window;
  };
}

export interface SizingContext {
  profile: TargetProfile;
  springs: { front: CatalogueSpring[]; rear: CatalogueSpring[] };
  thresholds: WarningThresholds;
}

export type WarningCode =
  | 'friction-band-large'
  | 'reading-order'
  | 'implied-rate-mismatch'
  | 'static-load-mismatch'
  | 'topped-out'
  | 'bottomed-out'
  | 'small-static-sag'
  | 'coil-bind'
  | 'adjuster-range'
  | 'weights-implausible'
  | 'regressive-linkage'
  | 'fork-air-ignored'
  | 'gas-force-unknown'
  | 'single-rate-equivalent'
  | 'weights-mode'
  | 'no-candidate'
  | 'target-invalid'
  | 'window-unreachable'
  | 'rounding-outside-window';

export interface SizingWarning {
  code: WarningCode;
  level: 'warning' | 'note';
  message: string;
  hint: string;
}

export type SizingMode = 'weights' | 'readings';

/** The fitted spring at settings a person can make: it keeps both windows, or its rate, or the adjuster, does not let it. */
export type Verdict = 'keep' | 'too-soft' | 'too-stiff' | 'preload-out-of-range';

export type AdjusterUnit = 'turns' | 'steps' | 'mm';

export interface RangeMm {
  min: number;
  max: number;
}

/**
 * Where a setting leaves the two sags, best first: both inside their windows; rider sag inside
 * with static sag deep (a stiff spring's compromise); static sag inside (a soft spring's); neither,
 * but off the stops; at a stop (topped out without the rider, or bottomed with him).
 */
export type SettingFit = 'both' | 'rider' | 'static' | 'off' | 'at-stop';

export interface TargetUsed {
  discipline: string;
  label: string;
  source: 'profile' | 'request';
  riderSagMm: RangeMm;
  staticSagMm: RangeMm;
  riderSagPct: RangeMm;
  staticSagPct: RangeMm;
  /** Middles of the windows (S*, T*). */
  riderMiddleMm: number;
  staticMiddleMm: number;
  /** Rider sag the fitted spring's preload is aimed at: the middle, or the nearest that keeps both sags in and the adjuster reaches. */
  aimRiderSagMm: number;
}

export interface LoadsN {
  staticN: number;
  riderN: number;
}

export interface EndLoadsResult extends LoadsN {
  /** 'rider-reading': the static reading was topped out, so only the total under the rider is calibrated. */
  source: 'calibrated' | 'rider-reading' | 'intake';
  calibrated: LoadsN | null;
  intake: LoadsN;
  /** With a topped-out static reading: the most the static load can be, since it did not move the end off its top. */
  staticMaxN: number | null;
}

export interface PreloadAdvice {
  currentMm: number;
  /** Unrounded preload aimed at: rider sag on the aim (5c), or the compromise an interim setting aims at. */
  neededMm: number;
  changeMm: number;
  changeUnits: number;
  unit: AdjusterUnit;
  direction: 'add' | 'remove' | 'none';
  roundedChangeUnits: number;
  roundedChangeMm: number;
  /** Absolute adjuster setting after the rounded change. */
  position: number;
  /** The aim lies outside rangeMm (the adjuster's stops, the captive minimum, coil-bind); the setting stops at its edge. */
  limitedByRange: boolean;
  rangeMm: RangeMm;
  riderSagAfterMm: number | null;
  staticSagAfterMm: number | null;
  /** With a topped-out static reading, the most static sag can be at the new setting; null otherwise. */
  staticSagAfterMaxMm: number | null;
  /** Where the setting leaves the sags. */
  fit: SettingFit;
  /** Until a better spring is fitted: the fitted spring cannot keep both windows at any setting. */
  interim: boolean;
  /** Left before coil-bind at full travel with this setting; null when the spring's coil-bind length is not known. */
  coilBindMarginMm: number | null;
  instruction: string;
}

export interface CandidateResult {
  sku: string;
  family: string;
  rateNmm: number;
  secondRateNmm: number | null;
  breakMm: number | null;
  /** Unrounded preload aimed at for it; null where none holds rider sag on the aim (a linkage whose x' falls). */
  preloadMm: number | null;
  /** Rounded change from the current setting, in adjuster units; null when no setting can be made for it. */
  preloadUnits: number | null;
  unit: AdjusterUnit;
  position: number | null;
  /** Preload at that setting; the sags below are the ones it gives. */
  setPreloadMm: number | null;
  staticSagMm: number | null;
  riderSagMm: number | null;
  staticSagPct: number | null;
  riderSagPct: number | null;
  /** Where its best setting leaves the sags; null with no setting at all. */
  fit: SettingFit | null;
  /** Static sag at the setting is 0: the preload holds the end topped out without the rider. */
  toppedOut: boolean;
  coilBindMarginMm: number | null;
  available: number;
  inStock: boolean;
  /** Offered as a fit: both sags inside their windows at a setting the adjuster can make. */
  feasible: boolean;
  /** How far its sags land from the middles, in half-windows (0 on both middles); ranks the fits. */
  missScore: number | null;
  reason: string | null;
}

export interface StepFigures {
  /** Fraction of the step (0.208 = 20.8 %). */
  overshoot: number;
  /** Null when the response never peaks (load step, zeta >= 1). */
  peakTimeS: number | null;
}

export interface PreviewCurve {
  wnRadS: number;
  zeta: number;
  road: StepFigures;
  load: StepFigures;
}

export interface RidePreview {
  assumedDampingRatio: number;
  old: PreviewCurve | null;
  new: PreviewCurve | null;
  /** A chart span covering a few periods of the slower curve. */
  durationS: number | null;
  note: string;
}

export interface FromWeightsFigures {
  staticSagMm: number | null;
  riderSagMm: number | null;
  idealRateNmm: number | null;
}

/** A spring as the decision names it: a dual-rate one by its label (6.5/9 N/mm), never by its rate at sag. */
export interface SpringName {
  rateNmm: number;
  secondRateNmm: number | null;
}

/** A catalogue spring the decision offers. */
export interface SpringOffer extends SpringName {
  sku: string;
  family: string;
  inStock: boolean;
  available: number;
}

/** A setting a person makes, with the sags it gives. */
export interface SettingStep {
  unit: AdjusterUnit;
  /** Signed change from the current setting, in adjuster units; positive adds preload. */
  changeUnits: number;
  position: number;
  riderSagMm: number | null;
  staticSagMm: number | null;
  /** With a topped-out static reading: the most static sag can be. */
  staticSagMaxMm: number | null;
}

export type DecisionStep =
  | { kind: 'preload'; interim: boolean; spring: SpringName; setting: SettingStep }
  | { kind: 'fit-spring'; spring: SpringOffer; setting: SettingStep }
  | { kind: 'order-spring'; rateNmm: number | null; family: string }
  | { kind: 'spacer'; lengthMm: number; setting: SettingStep }
  | { kind: 'consider-spring'; better: SpringOffer | null; inStock: SpringOffer | null; orderRateNmm: number | null }
  | { kind: 'remeasure'; end: EndKind; items: RemeasureItem[] }
  | { kind: 'measure-static'; staticSagMaxMm: number | null };

export type RemeasureItem = 'friction' | 'weights' | 'geometry' | 'spring-label' | 'preload';

export type DecisionReason =
  | { code: 'inside-windows'; riderSagMm: number; staticSagMm: number; rider: RangeMm; static: RangeMm }
  | { code: 'band-crosses-limit'; differenceMm: number; bandMm: number; limitMm: number | null; side: 'soft' | 'stiff' }
  | { code: 'rate-off-ideal'; installed: SpringName; effectiveRateNmm: number; idealRateNmm: number; offPct: number }
  | { code: 'near-window-edge'; which: 'rider' | 'static'; sagMm: number; bandMm: number; window: RangeMm }
  | { code: 'too-soft' | 'too-stiff'; installed: SpringName; idealRateNmm: number | null }
  | { code: 'adjuster-limit'; cause: 'range' | 'steps' | 'coil-bind'; neededMm: number; rangeMm: RangeMm }
  | { code: 'rate-mismatch'; impliedRateNmm: number; bandNmm: number | null; statedRateNmm: number }
  | { code: 'load-mismatch'; readingN: number; weighedN: number }
  | { code: 'static-topped-out'; riderSagMm: number }
  | { code: 'shelf-short'; spring: SpringOffer; riderSagMm: number | null; staticSagMm: number | null; rider: RangeMm; static: RangeMm }
  | { code: 'none-in-catalogue'; family: string }
  | { code: 'targets-invalid' };

/**
 * keep: the fitted spring with a setting that keeps both sags in their windows. marginal: the same,
 * but the readings' band or the rate's distance from the ideal leaves it on the edge. change: the
 * fitted spring cannot be set inside both windows. check: the readings and the stated spring
 * disagree, so nothing is to be acted on before re-measuring. none: the targets cannot be aimed at.
 */
export type DecisionKind = 'keep' | 'marginal' | 'change' | 'check' | 'none';

/** How far the decision can be trusted: from readings, marginal, from the weights alone, bounded by a topped-out reading, or in doubt. */
export type Certainty = 'measured' | 'marginal' | 'estimate' | 'bounded' | 'unsure';

export interface DampingHint {
  direction: 'more' | 'less' | 'same';
  /** The new spring's rate; the hint holds only if it is fitted. */
  spring: SpringName;
  /** Offered, not advised: the spring is the better option of a marginal keep. */
  conditional: boolean;
}

/** The decision's sentences, written in one set of units. */
export interface DecisionText {
  headline: string;
  steps: string[];
  reasons: string[];
  certainty: string;
  /** Only with a spring change: where to start the rebound damping. */
  damping: string | null;
}

export interface EndDecision {
  kind: DecisionKind;
  certainty: Certainty;
  /** The fitted spring, as labelled. */
  installed: SpringName;
  /** What to do, in order; each step can be set on the bike. */
  steps: DecisionStep[];
  /** Why, for whoever opens it. */
  reasons: DecisionReason[];
  /** The spring to fit (change) or the better option (marginal): what a quote is built on. */
  pick: SpringOffer | null;
  dampingHint: DampingHint | null;
  /** The sentences in SI units, for readers of the API; screens write them in the user's units from the fields above. */
  text: DecisionText;
  /** Made by an engine before the decision was worked out as steps: only its headline, as it was written, is known. */
  legacy?: true;
}

/** Rider sag minus static sag, with the readings' band and the limits the fitted spring must keep it within (5c). */
export interface SagDifference {
  mm: number;
  /** Plus or minus: the two readings' friction bands added, as bounds add (Taylor, ch. 2 and 3). */
  bandMm: number | null;
  /** Above this the spring is too soft; null where the limits move with preload (a linkage or a dual-rate spring). */
  softLimitMm: number | null;
  /** Below this the spring is too stiff. */
  stiffLimitMm: number | null;
}

export interface LoadCaseResult {
  name: string;
  massKg: number;
  /** Added wheel load on this end. */
  addedLoadN: number;
  /** The spring the case is set on: the one the decision settles on. */
  spring: SpringName;
  unit: AdjusterUnit;
  /** Change from the solo setting, in adjuster units; positive adds preload. */
  changeUnits: number;
  position: number;
  preloadMm: number;
  riderSagMm: number | null;
  /** A setting the adjuster can make brings rider sag back to solo's, or, stopped short, still inside its window. */
  carries: boolean;
  /** What stops the setting short: the adjuster's range, coil-bind, or a rider sag past its window at the limit. */
  limit: 'range' | 'coil-bind' | null;
}

export interface EndResult {
  end: EndKind;
  mode: SizingMode;
  travelMm: number;
  staticSagMm: number | null;
  riderSagMm: number | null;
  staticSagPct: number | null;
  riderSagPct: number | null;
  /** Plus or minus half the spread of each pushed/lifted pair. */
  frictionBandMm: { static: number | null; rider: number | null } | null;
  sagDifference: SagDifference | null;
  target: TargetUsed;
  loads: EndLoadsResult;
  /** The fitted spring as labelled. */
  installedSpring: SpringName;
  /** The fitted spring's rate over the sag range (its label rate unless dual-rate). */
  installedRateNmm: number;
  impliedRateNmm: number | null;
  /** Plus or minus, carried from the friction band. */
  impliedRateBandNmm: number | null;
  idealRateNmm: number | null;
  /** Plus or minus, carried from the friction band. */
  idealRateBandNmm: number | null;
  fromWeights: FromWeightsFigures;
  verdict: Verdict | null;
  /** The decision's headline in SI units. */
  verdictText: string;
  decision: EndDecision;
  preload: PreloadAdvice | null;
  /** Now: the bike as set now. After: the spring and setting the decision settles on. */
  rideFrequencyHz: { current: number | null; after: number | null; note: string };
  dampingRatioScale: number | null;
  recommendation: {
    inStock: CandidateResult | null;
    best: CandidateResult | null;
    /** The nearest spring on the shelf, fit or not: what the decision names when none on the shelf fits. */
    closestInStock: CandidateResult | null;
    candidates: CandidateResult[];
  };
  loadCases: LoadCaseResult[];
  preview: RidePreview;
  warnings: SizingWarning[];
}

export interface SizingResult {
  engineVersion: string;
  discipline: string;
  profileLabel: string;
  front?: EndResult;
  rear?: EndResult;
}
