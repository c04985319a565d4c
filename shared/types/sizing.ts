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

export interface RiderMasses {
  bodyKg: number;
  gearKg: number;
  /** Luggage or passenger. */
  luggageKg: number;
  rearShare: number;
  /** Above 1 for a top box behind the rear axle. */
  luggageRearShare?: number;
}

export interface SizingRequest {
  discipline: string;
  bike: BikeMasses;
  rider: RiderMasses;
  front?: FrontRequest;
  rear?: RearRequest;
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
  /** Assumed when the request leaves it out. */
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

export type Verdict = 'keep' | 'too-soft' | 'too-stiff' | 'preload-out-of-range';

export type AdjusterUnit = 'turns' | 'steps' | 'mm';

export interface RangeMm {
  min: number;
  max: number;
}

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
  /** Rider sag the current spring's preload is aimed at: the middle, or the nearest that keeps both sags in and the adjuster reaches. */
  aimRiderSagMm: number;
}

export interface LoadsN {
  staticN: number;
  riderN: number;
}

export interface EndLoadsResult extends LoadsN {
  source: 'calibrated' | 'intake';
  calibrated: LoadsN | null;
  intake: LoadsN;
}

export interface PreloadAdvice {
  currentMm: number;
  /** Unrounded preload that puts rider sag on the aim. */
  neededMm: number;
  changeMm: number;
  changeUnits: number;
  unit: AdjusterUnit;
  direction: 'add' | 'remove' | 'none';
  roundedChangeUnits: number;
  roundedChangeMm: number;
  /** Absolute adjuster setting after the rounded change. */
  position: number;
  /** The needed preload lies outside rangeMm (the adjuster's stops, the captive minimum); the setting stops at its edge. */
  limitedByRange: boolean;
  rangeMm: RangeMm;
  riderSagAfterMm: number | null;
  staticSagAfterMm: number | null;
  instruction: string;
}

export interface CandidateResult {
  sku: string;
  family: string;
  rateNmm: number;
  secondRateNmm: number | null;
  breakMm: number | null;
  /** Unrounded preload that holds rider sag at S*; null where none does (a linkage whose x' falls). */
  preloadMm: number | null;
  /** Rounded change from the current setting, in adjuster units. */
  preloadUnits: number | null;
  unit: AdjusterUnit;
  position: number | null;
  /** Preload at that rounded setting; the sags below are the ones it gives. */
  setPreloadMm: number | null;
  staticSagMm: number | null;
  riderSagMm: number | null;
  staticSagPct: number | null;
  riderSagPct: number | null;
  /** Static sag at the setting is 0: the preload holds the end topped out without the rider. */
  toppedOut: boolean;
  coilBindMarginMm: number | null;
  available: number;
  inStock: boolean;
  feasible: boolean;
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
  target: TargetUsed;
  loads: EndLoadsResult;
  /** The installed spring's rate over the sag range (its label rate unless dual-rate). */
  installedRateNmm: number;
  impliedRateNmm: number | null;
  /** Plus or minus, carried from the friction band. */
  impliedRateBandNmm: number | null;
  idealRateNmm: number | null;
  fromWeights: FromWeightsFigures;
  verdict: Verdict | null;
  verdictText: string;
  preload: PreloadAdvice | null;
  rideFrequencyHz: { current: number | null; recommended: number | null; note: string };
  dampingRatioScale: number | null;
  reboundHint: 'more' | 'less' | 'same' | null;
  recommendation: {
    inStock: CandidateResult | null;
    best: CandidateResult | null;
    candidates: CandidateResult[];
  };
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
