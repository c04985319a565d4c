/**
 * A bike's values as the garage's form holds them: text in the person's units, shaped like the
 * bike's JSON; and back to SI for the shared schema and the API. Paths are those of bike.fields.ts;
 * each end's damping adjusters are a list of rows (`front.dampers[1].position`), settings as typed.
 */
import { getIn, setIn } from 'formik';
import type { ValidationError } from 'yup';

import { bikeField, type FieldQuantity } from '@shared/schemas/bike.fields';
import { formatNumber } from '@shared/sizing/format';
import type { BikeSpec } from '@shared/types/bike';
import type { DamperAdjuster, DamperUnit } from '@shared/types/damping';
import type { DisplayUnits } from '@shared/types/garage';
import type { EndKind } from '@shared/types/sizing';
import { parseUserNumber } from '@shared/units';

import { fromFieldText, toFieldText, type QuantityKind } from '../units/format';

export type BikeFormValues = Record<string, unknown> & {
  nickname: string;
  hasFront: boolean;
  hasRear: boolean;
};

const MASS_PATHS = ['masses.massKg', 'masses.frontShare', 'masses.unsprungFrontKg', 'masses.unsprungRearKg'];

const SPRING_PATHS = (end: EndKind) => [
  `${end}.rateNmm`,
  `${end}.secondRateNmm`,
  `${end}.breakMm`,
  `${end}.preloadMm`,
  `${end}.family`,
];

const ADJUSTER_PATHS = (end: EndKind) =>
  ['kind', 'mmPerUnit', 'position', 'minPosition', 'maxPosition', 'zeroReference', 'addsPreload'].map(
    (field) => `${end}.adjuster.${field}`,
  );

const GEOMETRY_PATHS: Record<EndKind, string[]> = {
  front: ['front.travelMm', 'front.springCount', 'front.rakeDeg'],
  rear: ['rear.wheelTravelMm', 'rear.shockStrokeMm', 'rear.gasForceN'],
};

/** The sections of the form, in the order a rider finds the values. */
export const FIELD_GROUPS = {
  masses: MASS_PATHS,
  ...Object.fromEntries(
    (['front', 'rear'] as const).flatMap((end) => [
      [`${end}Geometry`, GEOMETRY_PATHS[end]],
      [`${end}Spring`, SPRING_PATHS(end)],
      [`${end}Adjuster`, ADJUSTER_PATHS(end)],
    ]),
  ),
} as Record<string, string[]>;

/** What a rider changes on a bike copied from a shop model: springs and preload setting (and each damping adjuster's setting, DamperFields). */
export const RIDER_CHANGE_PATHS = (end: EndKind) => [`${end}.rateNmm`, `${end}.preloadMm`, `${end}.adjuster.position`];

const END_PATHS = (end: EndKind) => [...GEOMETRY_PATHS[end], ...SPRING_PATHS(end), ...ADJUSTER_PATHS(end)];

/** One damping adjuster as the form holds it: its numbers as typed. */
export type DamperRow = {
  kind: string;
  unit: DamperUnit;
  maxPosition: string;
  standard: string;
  position: string;
  dampingPerStepNsPerM: string;
};

const DAMPER_NUMBERS = ['maxPosition', 'standard', 'position', 'dampingPerStepNsPerM'] as const;

/** A new adjuster's row: counted in clicks, every number still to be typed. */
export function newDamperRow(kind: string): DamperRow {
  return { kind, unit: 'clicks', maxPosition: '', standard: '', position: '', dampingPerStepNsPerM: '' };
}

function toDamperRow(damper: DamperAdjuster): DamperRow {
  const row = { kind: damper.kind, unit: damper.unit } as DamperRow;
  for (const field of DAMPER_NUMBERS) row[field] = damper[field] === null ? '' : formatNumber(damper[field], 3);
  return row;
}

/** Empty is none (the schema says whether that may be); text that is no number goes on to fail as one. */
function damperFromRow(row: DamperRow): Record<string, unknown> {
  const damper: Record<string, unknown> = { kind: row.kind, unit: row.unit };
  for (const field of DAMPER_NUMBERS) damper[field] = row[field].trim() === '' ? null : (parseUserNumber(row[field]) ?? row[field]);
  return damper;
}

const CONVERTED: Partial<Record<FieldQuantity, QuantityKind>> = { length: 'length', mass: 'mass', rate: 'rate', force: 'force' };

function toText(value: unknown, quantity: FieldQuantity, units: DisplayUnits): string {
  if (value === null || value === undefined) return '';
  const kind = CONVERTED[quantity];
  if (kind && typeof value === 'number') return toFieldText(value, kind, units);
  if (typeof value === 'number') return formatNumber(value, 3);
  return String(value);
}

function fromText(text: unknown, quantity: FieldQuantity, units: DisplayUnits): unknown {
  if (quantity === 'text') return typeof text === 'string' ? text : '';
  if (quantity === 'choice') return text || undefined;
  if (typeof text !== 'string' || text.trim() === '') return null;
  const kind = CONVERTED[quantity];
  if (kind) return fromFieldText(text, kind, units);
  return parseUserNumber(text) ?? text;
}

export function specToForm(spec: Partial<BikeSpec>, nickname: string, units: DisplayUnits): BikeFormValues {
  let values: BikeFormValues = { nickname, hasFront: Boolean(spec.front), hasRear: Boolean(spec.rear) };
  const paths = [...MASS_PATHS, ...END_PATHS('front'), ...END_PATHS('rear')];
  for (const path of paths) {
    values = setIn(values, path, toText(getIn(spec, path), bikeField(path).quantity, units));
  }
  for (const end of ['front', 'rear'] as const) values = setIn(values, `${end}.dampers`, (spec[end]?.dampers ?? []).map(toDamperRow));
  return values;
}

function endFromForm(end: EndKind, values: BikeFormValues, units: DisplayUnits, base: Partial<BikeSpec>) {
  let result: Record<string, unknown> = end === 'rear' ? { linkage: base.rear?.linkage ?? null } : {};
  for (const path of [...GEOMETRY_PATHS[end], ...SPRING_PATHS(end), ...ADJUSTER_PATHS(end)]) {
    const value = fromText(getIn(values, path), bikeField(path).quantity, units);
    // An empty optional field is left out rather than sent as null where the schema wants a number.
    if (value !== null || !path.endsWith('minPosition')) result = setIn(result, path.slice(end.length + 1), value);
  }
  const rows = (getIn(values, `${end}.dampers`) as DamperRow[] | undefined) ?? [];
  return { ...result, dampers: rows.map(damperFromRow) };
}

/** The form's values as the API takes them; `base` supplies what the form does not edit (the linkage curve). */
export function formToSpec(values: BikeFormValues, units: DisplayUnits, base: Partial<BikeSpec> = {}) {
  let masses: Record<string, unknown> = {};
  for (const path of MASS_PATHS) {
    masses = setIn(masses, path.slice('masses.'.length), fromText(getIn(values, path), bikeField(path).quantity, units));
  }
  return {
    nickname: values.nickname,
    masses,
    front: values.hasFront ? endFromForm('front', values, units, base) : null,
    rear: values.hasRear ? endFromForm('rear', values, units, base) : null,
  };
}

/** Yup's errors as Formik's nested error object. */
export function toFormErrors(error: ValidationError): Record<string, unknown> {
  let errors: Record<string, unknown> = {};
  for (const inner of error.inner.length ? error.inner : [error]) {
    const path = inner.path || 'masses';
    if (getIn(errors, path) === undefined) errors = setIn(errors, path, inner.message);
  }
  return errors;
}
