/**
 * The rider's side of the product as the API answers it: the weigh-in and units on the rider's
 * profile, the measuring flow's draft, the stored sizing records and the garage's bikes.
 * SI throughout; shares are fractions of the weight on the rear wheel.
 */

import type { ForceUnit, LengthUnit, MassUnit, RateUnit } from '../units';
import type { Bike } from './bike';
import type { DecisionKind, EndKind, LoadCaseRequest, RangeMm, Readings, RiderMasses, SizingMode, SizingRequest, SizingResult, TargetProfile, Verdict } from './sizing';

export const GEAR_ITEMS = ['helmet', 'jacket', 'trousers', 'boots', 'gloves', 'backProtector', 'pack', 'other'] as const;

export type GearItem = (typeof GEAR_ITEMS)[number];

/** Mass of each item worn, kg; an item left out is not worn. */
export type Gear = Partial<Record<GearItem, number>>;

export const LOAD_KINDS = ['passenger', 'panniers', 'top-box', 'tank-bag', 'other'] as const;

export type LoadKind = (typeof LOAD_KINDS)[number];

/** A passenger or a piece of luggage, with the share of its weight on the rear wheel (above 1 behind the axle). */
export interface CarriedLoad {
  kind: LoadKind;
  massKg: number;
  rearShare: number;
}

export const RIDING_POSITIONS = ['feet-forward', 'upright', 'neutral', 'leaning', 'crouched'] as const;

export type RidingPosition = (typeof RIDING_POSITIONS)[number];

export interface WeighIn {
  bodyKg: number;
  gear: Gear;
  loads: CarriedLoad[];
  /** A target profile's discipline, e.g. 'road'. */
  discipline: string;
  position: RidingPosition;
  /** The rider's rear share: the position's typical share unless the rider changed it. */
  rearShare: number;
}

export interface WeighInTotals {
  gearKg: number;
  /** Everything carried, passengers included. */
  luggageKg: number;
  /** The `rider` part of a sizing request: the solo rider in gear. */
  rider: RiderMasses;
  /** The `loadCases` of a sizing request: each adds preload on the spring the solo rider chose. */
  loadCases: LoadCaseRequest[];
}

/** GET and PUT /api/weigh-in. */
export interface WeighInAnswer {
  weighIn: WeighIn | null;
  /** ISO 8601 of the last save. */
  weighedAt: string | null;
  totals: WeighInTotals | null;
}

export const UNIT_SYSTEMS = ['metric', 'imperial'] as const;

export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export interface UnitsPreference {
  system: UnitSystem;
  rateUnit: RateUnit;
}

/** GET and PUT /api/me/units: the preference and the units it shows lengths, masses and forces in. */
export interface DisplayUnits extends UnitsPreference {
  length: LengthUnit;
  mass: MassUnit;
  force: ForceUnit;
}

/** Where the rider is in the measuring flow; a per-end step exists only for the ends chosen. */
export const MEASURING_STEPS = [
  'weigh-in',
  'ends',
  'front-extended',
  'front-static',
  'front-rider',
  'rear-extended',
  'rear-static',
  'rear-rider',
  'review',
] as const;

export type MeasuringStep = (typeof MEASURING_STEPS)[number];

/** A loaded reading as far as it has been taken: one length, or the pushed/lifted pair, either half missing. */
export type DraftLengthReading = number | { pushedMm?: number; liftedMm?: number };

export interface DraftEndReadings {
  extendedMm?: number;
  staticMm?: DraftLengthReading;
  riderMm?: DraftLengthReading;
}

export interface DraftAnswers {
  weighInConfirmed?: boolean;
  ends?: EndKind[];
  front?: DraftEndReadings;
  rear?: DraftEndReadings;
}

/** What the last saved pass measured, shown beside the fields when re-measuring after adjusting. */
export interface DraftHints {
  fromRecordId: number;
  measuredAt: string;
  ends: EndKind[];
  front: Readings | null;
  rear: Readings | null;
}

export interface MeasuringDraft {
  bikeId: number;
  step: MeasuringStep;
  answers: DraftAnswers;
  hints: DraftHints | null;
  createdAt: string;
  updatedAt: string;
}

export interface DraftSummary {
  step: MeasuringStep;
  updatedAt: string;
}

export const SIZING_SOURCES = ['rider', 'desk'] as const;

export type SizingSource = (typeof SIZING_SOURCES)[number];

/** One end of a pass, small enough to list and to chart. Sag figures are measured or, from weights, predicted. */
export interface EndSummary {
  mode: SizingMode;
  travelMm: number;
  staticSagMm: number | null;
  riderSagMm: number | null;
  staticSagPct: number | null;
  riderSagPct: number | null;
  targetRiderSagPct: RangeMm;
  targetStaticSagPct: RangeMm;
  verdict: Verdict | null;
  /** What the pass advised: keep, marginal, change, check first; null for passes made before decisions. */
  decision: DecisionKind | null;
  installedRateNmm: number;
  preloadMm: number;
  /** The best spring overall, when the engine found one. */
  bestRateNmm: number | null;
}

export interface SizingRecordSummary {
  id: number;
  /** Null once the bike has been deleted; the record itself stays. */
  bikeId: number | null;
  riderId: number;
  createdById: number | null;
  source: SizingSource;
  discipline: string;
  profileLabel: string;
  engineVersion: string;
  createdAt: string;
  front: EndSummary | null;
  rear: EndSummary | null;
}

/** A saved pass: the request the engine ran, its answer, the profile and the weigh-in it used. */
export interface SizingRecord extends SizingRecordSummary {
  request: SizingRequest;
  result: SizingResult;
  profile: TargetProfile;
  /** Null when the pass was run from a full request rather than a weigh-in. */
  weighIn: WeighIn | null;
}

/** A bike as the garage lists it: with its open draft and its latest pass. */
export interface GarageBike extends Bike {
  draft: DraftSummary | null;
  lastSizing: SizingRecordSummary | null;
}
