/**
 * A bike as the garage and the shop's model catalogue store it. The fields of `masses`, `front`
 * and `rear` are those of the sizing request (`bike`, `front`, `rear` of POST /api/sizing), one to
 * one, plus what only the rider needs: the adjusters' zero and turning direction, and the damping
 * adjusters. SI throughout: mm, kg, N, N/mm; damping adjusters in their own clicks or turns.
 */

import type { DamperAdjuster } from './damping';
import type { Adjuster, BikeMasses, EndKind, LinkagePoint } from './sizing';

/** Which way of working the preload adjuster adds preload. */
export const PRELOAD_DIRECTIONS = ['clockwise', 'counter-clockwise', 'longer spacer'] as const;

export type PreloadDirection = (typeof PRELOAD_DIRECTIONS)[number];

export interface PreloadAdjuster extends Adjuster {
  /** Where the count starts, in words ("collar backed off to the circlip", "cap fully out"). */
  zeroReference: string;
  addsPreload: PreloadDirection;
}

interface EndSpecCommon {
  rateNmm: number;
  /** Dual-rate spring: the rate above breakMm; both null for a single-rate spring. */
  secondRateNmm: number | null;
  breakMm: number | null;
  preloadMm: number;
  family: string;
  adjuster: PreloadAdjuster;
  /** The end's damping adjusters, each kind at most once; empty when it has none. */
  dampers: DamperAdjuster[];
}

export interface FrontSpec extends EndSpecCommon {
  travelMm: number;
  springCount: 1 | 2;
  rakeDeg: number;
}

export interface RearSpec extends EndSpecCommon {
  wheelTravelMm: number;
  shockStrokeMm: number;
  /** Null when unknown (the engine then notes it and assumes none). */
  gasForceN: number | null;
  /** Null for a constant leverage ratio. */
  linkage: LinkagePoint[] | null;
}

export interface BikeSpec {
  masses: BikeMasses;
  /** Null when that end is not sized (an air fork, or not known). At least one end is given. */
  front: FrontSpec | null;
  rear: RearSpec | null;
}

export type EndSpec<E extends EndKind> = E extends 'front' ? FrontSpec : RearSpec;

export interface BikeModel extends BikeSpec {
  id: number;
  name: string;
  description: string;
  /** ISO 8601. */
  createdAt: string;
  updatedAt: string;
}

export interface Bike extends BikeSpec {
  id: number;
  ownerId: number;
  nickname: string;
  /** The shop model it was made from; null when entered by hand or the model was deleted. */
  model: { id: number; name: string } | null;
  /** The load case it is set for (its name); null while it rides solo. */
  loadCase: string | null;
  createdAt: string;
  updatedAt: string;
}
