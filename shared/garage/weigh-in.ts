/**
 * The weigh-in's totals: the solo rider (body and itemised gear) that the sizing chooses the spring
 * for, and the load cases the carried loads make: with the passenger, with the luggage, with both.
 */

import type { CarriedLoad, Gear, WeighIn, WeighInTotals } from '../types/garage';
import type { LoadCaseRequest } from '../types/sizing';

/** Sums of decimal kilograms carry float noise (0.1 + 0.2); a microgram is far below any scale. */
function tidy(kg: number): number {
  return Math.round(kg * 1e9) / 1e9;
}

export function sumGear(gear: Gear): number {
  return tidy(Object.values(gear).reduce<number>((sum, kg) => sum + (kg ?? 0), 0));
}

export const LOAD_CASE_NAMES = {
  passenger: 'With passenger',
  luggage: 'With luggage',
  both: 'With passenger and luggage',
} as const;

/**
 * One load case for the loads given: their mass summed, and a rear share weighted by mass, so the
 * rear wheel carries the sum of each load's mass times its share, as the loads themselves put it.
 */
function combine(name: string, loads: readonly CarriedLoad[]): LoadCaseRequest {
  const massKg = tidy(loads.reduce((sum, load) => sum + load.massKg, 0));
  const rearShare = tidy(loads.reduce((sum, load) => sum + load.massKg * load.rearShare, 0) / massKg);
  return { name, massKg, rearShare };
}

export function loadCasesOf(loads: readonly CarriedLoad[]): LoadCaseRequest[] {
  const carried = loads.filter((load) => load.massKg > 0);
  const passengers = carried.filter((load) => load.kind === 'passenger');
  const luggage = carried.filter((load) => load.kind !== 'passenger');
  const cases: LoadCaseRequest[] = [];
  if (passengers.length > 0) cases.push(combine(LOAD_CASE_NAMES.passenger, passengers));
  if (luggage.length > 0) cases.push(combine(LOAD_CASE_NAMES.luggage, luggage));
  if (passengers.length > 0 && luggage.length > 0) cases.push(combine(LOAD_CASE_NAMES.both, carried));
  return cases;
}

export function totalWeighIn(weighIn: WeighIn): WeighInTotals {
  const gearKg = sumGear(weighIn.gear);
  const luggageKg = tidy(weighIn.loads.reduce((sum, load) => sum + load.massKg, 0));
  return {
    gearKg,
    luggageKg,
    rider: { bodyKg: weighIn.bodyKg, gearKg, rearShare: weighIn.rearShare },
    loadCases: loadCasesOf(weighIn.loads),
  };
}
