/** The rider's units: metric or imperial for lengths, masses and forces, and a rate unit of its own. */

import type { FieldQuantity } from '../schemas/bike.fields';
import type { DisplayUnits, UnitsPreference, UnitSystem } from '../types/garage';
import type { AdjusterUnit } from '../types/sizing';
import type { DisplayUnit, RateUnit } from '../units';

export const RATE_UNITS: readonly RateUnit[] = ['N/mm', 'kgf/mm', 'lbf/in'];

export const DEFAULT_UNITS: UnitsPreference = { system: 'metric', rateUnit: 'N/mm' };

export function defaultRateUnit(system: UnitSystem): RateUnit {
  return system === 'metric' ? 'N/mm' : 'lbf/in';
}

export function toDisplayUnits(preference: UnitsPreference): DisplayUnits {
  const metric = preference.system === 'metric';
  return { ...preference, length: metric ? 'mm' : 'in', mass: metric ? 'kg' : 'lb', force: metric ? 'N' : 'lbf' };
}

export type QuantityKind = 'length' | 'mass' | 'rate' | 'force';

/** The person's unit for one kind of quantity. */
export function unitFor(kind: QuantityKind, units: DisplayUnits): DisplayUnit {
  switch (kind) {
    case 'length':
      return units.length;
    case 'mass':
      return units.mass;
    case 'rate':
      return units.rateUnit;
    case 'force':
      return units.force;
  }
}

/** The unit a bike field is shown in; '' for plain numbers, text and choices. */
export function displayUnitOf(quantity: FieldQuantity, units: DisplayUnits, adjusterUnit: AdjusterUnit = 'turns'): string {
  switch (quantity) {
    case 'length':
    case 'points':
      return units.length;
    case 'mass':
    case 'rate':
    case 'force':
      return unitFor(quantity, units);
    case 'adjuster':
      return adjusterUnit;
    case 'angle':
      return 'deg';
    default:
      return '';
  }
}
