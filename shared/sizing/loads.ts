/**
 * Sprung wheel loads (N), static part and rider part, from the intake masses (section 2), or
 * calibrated from the measured sags and the installed spring (section 5b). The rider part is the
 * solo rider's: a passenger or luggage is a load case on the spring the solo sizing chose (section 6).
 */

import type { BikeMasses, EndKind, LoadsN, RiderMasses } from '../types/sizing';
import type { EndModel } from './end-model';
import { findUncalibratable, SAME_LENGTH_MM } from './readings';
import type { SpringLaw } from './spring-law';

/** Standard gravity, exact by definition (CGPM 1901; NIST SP 811). */
export const STANDARD_GRAVITY = 9.80665;

/** The solo loads: the bike, and the rider in gear. A passenger or luggage is a load case on top (addedLoadN). */
export function computeIntakeLoads(bike: BikeMasses, rider: RiderMasses, end: EndKind): LoadsN {
  const person = rider.bodyKg + rider.gearKg;
  if (end === 'front') {
    return {
      staticN: (bike.massKg * bike.frontShare - bike.unsprungFrontKg) * STANDARD_GRAVITY,
      riderN: person * (1 - rider.rearShare) * STANDARD_GRAVITY,
    };
  }
  return {
    staticN: (bike.massKg * (1 - bike.frontShare) - bike.unsprungRearKg) * STANDARD_GRAVITY,
    riderN: person * rider.rearShare * STANDARD_GRAVITY,
  };
}

/** The wheel load a carried mass adds to one end; a rear share above 1 (a top box behind the axle) unloads the front. */
export function addedLoadN(massKg: number, rearShare: number, end: EndKind): number {
  return massKg * (end === 'front' ? 1 - rearShare : rearShare) * STANDARD_GRAVITY;
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

/**
 * With a topped-out static reading the rider reading still gives the total load. The static load is
 * at most what the preload holds at full extension, since it did not move the end off its top; the
 * weighed static load stands in for it, held to that bound. Null when the rider reading gives no load.
 */
export function calibrateFromRiderReading(
  model: EndModel,
  spring: SpringLaw,
  preloadMm: number,
  riderSagMm: number,
  intakeStaticN: number,
): (LoadsN & { staticMaxN: number }) | null {
  if (!(riderSagMm >= SAME_LENGTH_MM) || !(riderSagMm <= model.travelMm - SAME_LENGTH_MM)) return null;
  const totalN = model.loadAtSag(spring, preloadMm, riderSagMm);
  const staticMaxN = model.loadAtSag(spring, preloadMm, 0);
  const staticN = Math.min(intakeStaticN, staticMaxN);
  const riderN = totalN - staticN;
  if (!(staticN > 0) || !(riderN > 0)) return null;
  return { staticN, riderN, staticMaxN };
}

export function computeSprungMassKg(loads: LoadsN): number {
  return (loads.staticN + loads.riderN) / STANDARD_GRAVITY;
}
