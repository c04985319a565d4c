/** The weigh-in's totals: itemised gear and loads summed into the `rider` part of a sizing request. */

import type { Gear, WeighIn, WeighInTotals } from '../types/garage';

/** Sums of decimal kilograms carry float noise (0.1 + 0.2); a microgram is far below any scale. */
function tidy(kg: number): number {
  return Math.round(kg * 1e9) / 1e9;
}

export function sumGear(gear: Gear): number {
  return tidy(Object.values(gear).reduce<number>((sum, kg) => sum + (kg ?? 0), 0));
}

/**
 * The loads' rear share is weighted by mass: the rear wheel carries the sum of each load's mass
 * times its share, so one combined load with that share puts the same weight on each wheel.
 */
export function totalWeighIn(weighIn: WeighIn): WeighInTotals {
  const gearKg = sumGear(weighIn.gear);
  const luggageKg = tidy(weighIn.loads.reduce((sum, load) => sum + load.massKg, 0));
  const luggageRearShare =
    luggageKg > 0 ? tidy(weighIn.loads.reduce((sum, load) => sum + load.massKg * load.rearShare, 0) / luggageKg) : null;
  return {
    gearKg,
    luggageKg,
    luggageRearShare,
    rider: {
      bodyKg: weighIn.bodyKg,
      gearKg,
      luggageKg,
      rearShare: weighIn.rearShare,
      ...(luggageRearShare === null ? {} : { luggageRearShare }),
    },
  };
}
