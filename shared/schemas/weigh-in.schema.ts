/**
 * The weigh-in (PUT /api/weigh-in) and the units preference (PUT /api/me/units). A rear share left
 * out is filled in from the riding position or the kind of load, so the form can offer the typical
 * value and the rider can overwrite it.
 */

import { array, mixed, object, string } from 'yup';
import { RATE_UNITS } from '../garage/units';
import { sumGear } from '../garage/weigh-in';
import { GEAR_ITEMS, LOAD_KINDS, RIDING_POSITIONS, UNIT_SYSTEMS, type LoadKind, type RidingPosition, type UnitSystem } from '../types/garage';
import type { RateUnit } from '../units';
import { numberField, optionalNumberField } from './number-field';
import { GEAR_ITEMS_INFO, LOAD_KINDS_INFO, RIDING_POSITIONS_INFO } from './weigh-in.fields';

/** The sizing request's limits (shared/schemas/sizing.schema.ts), so a saved weigh-in always sizes. */
export const GEAR_MAX_KG = 80;
export const LUGGAGE_MAX_KG = 300;
export const LOADS_MAX = 6;

const isBlank = (value: unknown) => value === undefined || value === null || value === '';

const gearSchema = object(
  Object.fromEntries(
    GEAR_ITEMS.map((item) => [item, optionalNumberField(GEAR_ITEMS_INFO[item].label, { min: 0, max: GEAR_ITEMS_INFO[item].maxKg }, 'kg')]),
  ),
)
  .default(() => ({}))
  .test('gear-total', function (gear) {
    const total = sumGear((gear ?? {}) as Record<string, number | undefined>);
    if (!(total > GEAR_MAX_KG)) return true;
    return this.createError({ message: `The gear adds up to more than ${GEAR_MAX_KG} kg: check each item.` });
  });

const loadSchema = object({
  kind: mixed<LoadKind>()
    .required('Say what the load is: a passenger, panniers, a top box, a tank bag or other.')
    .oneOf(LOAD_KINDS, 'Say what the load is: a passenger, panniers, a top box, a tank bag or other.'),
  massKg: numberField('Load mass', { min: 0, max: LUGGAGE_MAX_KG, aboveMin: true }, 'kg'),
  rearShare: numberField('Load rear share', { min: 0, max: 1.5 }, ''),
}).transform((value) => {
  if (value && isBlank(value.rearShare) && value.kind in LOAD_KINDS_INFO) {
    return { ...value, rearShare: LOAD_KINDS_INFO[value.kind as LoadKind].rearShare };
  }
  return value;
});

export const weighInSchema = object({
  bodyKg: numberField('Body mass', { min: 20, max: 300 }, 'kg'),
  gear: gearSchema,
  loads: array()
    .of(loadSchema)
    .max(LOADS_MAX, `At most ${LOADS_MAX} loads: add similar ones together.`)
    .default(() => [])
    .test('loads-total', function (loads) {
      const total = (loads ?? []).reduce((sum, load) => sum + (Number.isFinite(load?.massKg) ? load.massKg : 0), 0);
      if (!(total > LUGGAGE_MAX_KG)) return true;
      return this.createError({ message: `The passenger and luggage add up to more than ${LUGGAGE_MAX_KG} kg: check each.` });
    }),
  discipline: string()
    .trim()
    .required('Choose how you ride: road, track, touring, trail or motocross.')
    .matches(/^[a-z][a-z0-9]*(-[a-z0-9]+)*$/, 'Choose one of the riding disciplines listed.')
    .max(40, 'Choose one of the riding disciplines listed.'),
  position: mixed<RidingPosition>()
    .required('Choose your riding position.')
    .oneOf(RIDING_POSITIONS, 'Choose one of the riding positions listed.'),
  rearShare: numberField('Your rear share', { min: 0, max: 1 }, ''),
})
  .default(undefined)
  .typeError('Send the weigh-in as an object of its values.')
  .required('The weigh-in is missing.')
  .transform((value) => {
    if (value && isBlank(value.rearShare) && value.position in RIDING_POSITIONS_INFO) {
      return { ...value, rearShare: RIDING_POSITIONS_INFO[value.position as RidingPosition].rearShare };
    }
    return value;
  });

export const unitsPreferenceSchema = object({
  system: mixed<UnitSystem>().required('Choose metric or imperial.').oneOf(UNIT_SYSTEMS, 'Choose metric or imperial.'),
  /** Left out: N/mm for metric, lbf/in for imperial. */
  rateUnit: mixed<RateUnit>().optional().oneOf(RATE_UNITS, 'Choose N/mm, kgf/mm or lbf/in.'),
}).typeError('Send the units as { system, rateUnit }.');
