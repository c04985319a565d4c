/**
 * Sprung wheel loads (N), static part and rider part, from the intake masses (section 2), or
 * calibrated from the measured sags and the installed spring (section 5b).
 */

import type { BikeMasses, EndKind, LoadsN, RiderMasses } from '../types/sizing';
import type { EndModel } from './end-model';
import { findUncalibratable } from './readings';
import type { SpringLaw } from './spring-law';

/** Standard gravity, exact by definition (CGPM 1901; NIST SP 811). */
export const STANDARD_GRAVITY = 9.80665;

export function computeIntakeLoads(
  bike: BikeMasses,
  rider: RiderMasses,
  end: EndKind,
  defaultLuggageRearShare: number,
): LoadsN {
  const person = rider.bodyKg + rider.gearKg;
  const luggageRear = rider.luggageRearShare ?? defaultLuggageRearShare;
  if (end === 'front') {
    return {
      staticN: (bike.massKg * bike.frontShare - bike.unsprungFrontKg) * STANDARD_GRAVITY,
      riderN: (person * (1 - rider.rearShare) + rider.luggageKg * (1 - luggageRear)) * STANDARD_GRAVITY,
    };
  }
  return {
    staticN: (bike.massKg * (1 - bike.frontShare) - bike.unsprungRearKg) * STANDARD_GRAVITY,
    riderN: (person * rider.rearShare + rider.luggageKg * luggageRear) * STANDARD_GRAVITY,
  };
}

/**
 * Loads that the installed spring must carry to sit at the measured sags. Null unless both sags
 * show the end off its stops and the rider's sag exceeds the static one: otherwise the readings
 * only bound the loads.
 */
export function calibrateLoads(
  model: EndModel,
  spring: SpringLaw,
  preloadMm: number,
  staticSagMm: number,
  riderSagMm: number,
): LoadsN | null {
  if (findUncalibratable({ staticSagMm, riderSagMm }, model.travelMm) !== null) return null;
  const staticN = model.loadAtSag(spring, preloadMm, staticSagMm);
  const riderN = model.loadAtSag(spring, preloadMm, riderSagMm) - staticN;
  if (!(staticN > 0) || !(riderN > 0)) return null;
  return { staticN, riderN };
}

export function computeSprungMassKg(loads: LoadsN): number {
  return (loads.staticN + loads.riderN) / STANDARD_GRAVITY;
}
