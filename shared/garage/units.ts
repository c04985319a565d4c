/** The rider's units: metric or imperial for lengths, masses and forces, and a rate unit of its own. */

import type { FieldQuantity } from '../schemas/bike.fields';
import type { DisplayUnits, UnitsPreference, UnitSystem } from '../types/garage';
import type { AdjusterUnit } from '../types/sizing';
import type { RateUnit } from '../units';

export const RATE_UNITS: readonly RateUnit[] = ['N/mm', 'kgf/mm', 'lbf/in'];

export const DEFAULT_UNITS: UnitsPreference = { system: 'metric', rateUnit: 'N/mm' };

export function defaultRateUnit(system: UnitSystem): RateUnit {
  return system === 'metric' ? 'N/mm' : 'lbf/in';
}

export function toDisplayUnits(preference: UnitsPreference): DisplayUnits {
  const metric = preference.system === 'metric';
  return { ...preference, length: metric ? 'mm' : 'in', mass: metric ? 'kg' : 'lb', force: metric ? 'N' : 'lbf' };
}

/** The unit a bike field is shown in; '' for plain numbers, text and choices. */
export function displayUnitOf(quantity: FieldQuantity, units: DisplayUnits, adjusterUnit: AdjusterUnit = 'turns'): string {
  switch (quantity) {
    case 'length':
    case 'points':
      return units.length;
    case 'mass':
      return units.mass;
    case 'rate':
      return units.rateUnit;
    case 'force':
      return units.force;
    case 'adjuster':
      return adjusterUnit;
    case 'clicks':
      return 'clicks';
    case 'angle':
      return 'deg';
    default:
      return '';
  }
}
