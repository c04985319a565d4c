/**
 * A sizing request (the body of POST /api/sizing) from a stored bike, a weigh-in and the readings
 * taken. The bike's values map one to one onto the request; what only the rider needs (the
 * adjuster's zero and turning direction, the damping adjusters) stays behind.
 */

import type { BikeSpec, FrontSpec, RearSpec } from '../types/bike';
import type { WeighIn } from '../types/garage';
import type { EndKind, FrontRequest, Readings, RearRequest, SizingRequest } from '../types/sizing';
import { totalWeighIn } from './weigh-in';

function springPart(spec: FrontSpec | RearSpec) {
  const { zeroReference: _zero, addsPreload: _adds, ...adjuster } = spec.adjuster;
  return {
    rateNmm: spec.rateNmm,
    ...(spec.secondRateNmm !== null ? { secondRateNmm: spec.secondRateNmm, breakMm: spec.breakMm } : {}),
    preloadMm: spec.preloadMm,
    family: spec.family,
    adjuster,
  };
}

export function toFrontRequest(spec: FrontSpec, readings?: Readings): FrontRequest {
  return {
    travelMm: spec.travelMm,
    springCount: spec.springCount,
    rakeDeg: spec.rakeDeg,
    ...springPart(spec),
    ...(readings ? { readings } : {}),
  };
}

export function toRearRequest(spec: RearSpec, readings?: Readings): RearRequest {
  return {
    wheelTravelMm: spec.wheelTravelMm,
    shockStrokeMm: spec.shockStrokeMm,
    ...(spec.gasForceN !== null ? { gasForceN: spec.gasForceN } : {}),
    ...(spec.linkage !== null ? { linkage: spec.linkage } : {}),
    ...springPart(spec),
    ...(readings ? { readings } : {}),
  };
}

/** The ends a bike can be sized on: those it has. */
export function endsOf(bike: Pick<BikeSpec, 'front' | 'rear'>): EndKind[] {
  return [...(bike.front ? ['front' as const] : []), ...(bike.rear ? ['rear' as const] : [])];
}

export interface SizingInputs {
  bike: BikeSpec;
  weighIn: WeighIn;
  /** Ends to size; one the bike lacks is left out. */
  ends: readonly EndKind[];
  /** An end without readings is sized from the weights alone. */
  readings?: Partial<Record<EndKind, Readings>>;
  dampingRatio?: number;
}

export function buildSizingRequest({ bike, weighIn, ends, readings = {}, dampingRatio }: SizingInputs): SizingRequest {
  const totals = totalWeighIn(weighIn);
  return {
    discipline: weighIn.discipline,
    bike: { ...bike.masses },
    rider: totals.rider,
    ...(totals.loadCases.length > 0 ? { loadCases: totals.loadCases } : {}),
    ...(ends.includes('front') && bike.front ? { front: toFrontRequest(bike.front, readings.front) } : {}),
    ...(ends.includes('rear') && bike.rear ? { rear: toRearRequest(bike.rear, readings.rear) } : {}),
    ...(dampingRatio !== undefined ? { dampingRatio } : {}),
  };
}
