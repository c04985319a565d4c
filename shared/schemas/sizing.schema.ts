/**
 * The body of POST /api/sizing, one schema for the client's forms and the server. Each message
 * says in plain words what to re-measure or fix. Numbers may be typed with a decimal comma.
 */

import { array, lazy, mixed, number, object, string, ValidationError, type TestContext } from 'yup';
import { SAME_LENGTH_MM } from '../sizing/readings';
import type { SizingRequest } from '../types/sizing';
import { toFieldErrors } from './field-errors';
import { parseUserNumber } from '../units/parse-number';

type Bounds = [number, number];

/** Ranges of the fields that the cross-field checks compare, so a value refused on its own is not judged again. */
const LENGTH_MM: Bounds = [0, 2000];
const FRONT_TRAVEL_MM: Bounds = [30, 350];
const REAR_TRAVEL_MM: Bounds = [30, 400];
const STROKE_MM: Bounds = [10, 200];
const TARGET_SAG_MM: Bounds = [0, 400];
const POSITION: Bounds = [-1000, 1000];
const BIKE_KG: Bounds = [30, 700];
const UNSPRUNG_KG: Bounds = [0, 150];
const SHARE: Bounds = [0, 1];

/** A number inside its field's range: aboveMin for the fields that refuse the lower bound itself. */
function within(value: unknown, [min, max]: Bounds, aboveMin = false): value is number {
  return isNum(value) && (aboveMin ? value > min : value >= min) && value <= max;
}

/** Typed text goes through the decimal-comma parser; null counts as left out. */
function readTyped(value: unknown, original: unknown): unknown {
  if (original === null) return undefined;
  if (typeof original === 'string') return original.trim() === '' ? undefined : (parseUserNumber(original) ?? NaN);
  return value;
}

interface QuantityOptions {
  /** The lower bound itself is refused (a rate of 0). */
  aboveMin?: boolean;
  optional?: boolean;
}

/**
 * A number in its range. Presence and range are one test rather than Yup's `required`, `min` and
 * `max`: each Yup test costs a validation context and its closures, and a sizing request has some
 * fifty numbers. The type check stays Yup's own, so what counts as a number is unchanged.
 */
function quantity(label: string, [min, max]: Bounds, unit: string, fix: string, options: QuantityOptions = {}) {
  const { aboveMin = false, optional = false } = options;
  const range = `${label} must be ${aboveMin ? 'above' : 'between'} ${min}${aboveMin ? ` and at most` : ' and'} ${max}${unit}: ${fix}.`;
  const missing = `${label} is missing: ${fix}.`;
  return number()
    .transform(readTyped)
    .typeError(`${label} must be a number: ${fix}.`)
    .test('quantity', function (value) {
      if (value === undefined) return optional || this.createError({ message: missing });
      return (aboveMin ? value > min : value >= min) && value <= max ? true : this.createError({ message: range });
    });
}

function isNum(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

const isLength = (v: unknown): v is number => within(v, LENGTH_MM, true);

const LENGTH_FIX = 'measure between the same two marks as the other readings, in mm';

/**
 * One length, or a pushed and lifted pair. Both shapes are built once: a lazy builder runs on every
 * validation, and building a Yup schema clones it at each chained call.
 */
function loadedReading(label: string) {
  const pair = object({
    pushedMm: quantity(`${label} after pushing down`, LENGTH_MM, ' mm', LENGTH_FIX, { aboveMin: true }),
    liftedMm: quantity(`${label} after lifting`, LENGTH_MM, ' mm', LENGTH_FIX, { aboveMin: true }),
  });
  const single = quantity(label, LENGTH_MM, ' mm', LENGTH_FIX, { aboveMin: true });
  return lazy((value: unknown) => (value !== null && typeof value === 'object' ? pair : single));
}

const readingsSchema = object({
  extendedMm: quantity('Extended length', LENGTH_MM, ' mm', 'measure it with the wheel off the ground, fully extended', {
    aboveMin: true,
  }),
  staticMm: loadedReading('Static length'),
  riderMm: loadedReading('Rider length'),
})
  .default(undefined)
  .nonNullable('The readings must be the extended, static and rider lengths, or left out to size from the weights.');

const targetSchema = object({
  riderSagMm: quantity('Target rider sag', TARGET_SAG_MM, ' mm', 'give the rider sag to aim at, or leave the target out', {
    aboveMin: true,
  }),
  staticSagMm: quantity('Target static sag', TARGET_SAG_MM, ' mm', 'give the static sag to aim at, or leave the target out'),
})
  .default(undefined)
  .nonNullable('The target must give a rider sag and a static sag, or be left out to use the profile.');

const adjusterSchema = object({
  kind: string()
    .required('Adjuster kind is missing: choose threaded, stepped or spacer.')
    .oneOf(['threaded', 'stepped', 'spacer'], 'Adjuster kind must be threaded, stepped or spacer.'),
  mmPerUnit: quantity('Preload per adjuster unit', [0, 50], ' mm', 'give the thread pitch (mm per turn), the mm per step, or 1 for a spacer', {
    aboveMin: true,
  }),
  position: quantity('Adjuster setting', POSITION, '', "count the current setting from the adjuster's zero"),
  maxPosition: quantity('Adjuster maximum', POSITION, '', 'give the highest setting the adjuster reaches'),
  minPosition: quantity('Adjuster minimum', POSITION, '', 'give the lowest setting, or leave it out for 0', {
    optional: true,
  }),
})
  .default(undefined)
  .required('The preload adjuster is missing: say whether it is threaded, stepped or a spacer.')
  .test('adjuster-range', function (adjuster) {
    if (!adjuster) return true;
    if (adjuster.minPosition !== undefined && !within(adjuster.minPosition, POSITION)) return true;
    const min = adjuster.minPosition ?? 0;
    if (!within(adjuster.maxPosition, POSITION)) return true;
    if (adjuster.maxPosition <= min) {
      return this.createError({
        path: `${this.path}.maxPosition`,
        message: "The adjuster's maximum must be above its minimum: check both settings.",
      });
    }
    if (within(adjuster.position, POSITION) && (adjuster.position < min || adjuster.position > adjuster.maxPosition)) {
      return this.createError({
        path: `${this.path}.position`,
        message: "The current setting lies outside the adjuster's range: re-count it from the adjuster's zero.",
      });
    }
    return true;
  });

function springTypeSchema(endName: string) {
  return mixed().nonNullable("Spring type must be 'coil', or left out.").test('coil-only', function (value) {
    if (value === undefined || value === 'coil') return true;
    if (value === 'air') {
      return this.createError({
        message: `An air-sprung ${endName} cannot be sized here: this model sizes coil springs only. Set the air spring from its pressure chart instead.`,
      });
    }
    return this.createError({ message: "Spring type must be 'coil'." });
  });
}

/**
 * Physical bounds per kind (from memory): the softest fork springs on small bikes run about 2 to
 * 4 N/mm and the softest shock springs about 20 to 30 N/mm, so anything under these is a slip of
 * the unit, not a spring that holds a motorcycle up.
 */
export const FORK_RATE_NMM: Bounds = [1, 50];
export const SHOCK_RATE_NMM: Bounds = [10, 500];

function commonEndFields(endName: string, rateBounds: Bounds) {
  return {
    rateNmm: quantity(`${capitalise(endName)} spring rate`, rateBounds, ' N/mm', 'read it from the spring or its paperwork, in N/mm (1 kgf/mm is 9.81 N/mm)'),
    maxDeflectionMm: quantity('Coil-bind deflection', [0, 500], ' mm', "give how far the fitted spring compresses before its coils touch, or leave it out", {
      aboveMin: true,
      optional: true,
    }),
    secondRateNmm: quantity('Second rate', [0, 500], ' N/mm', 'give the rate above the break point of a dual-rate spring, or leave it out', {
      aboveMin: true,
      optional: true,
    }),
    breakMm: quantity('Break point', [0, 500], ' mm', 'give the spring compression where the second rate starts, or leave it out', {
      aboveMin: true,
      optional: true,
    }),
    preloadMm: quantity(`${capitalise(endName)} preload`, [0, 100], ' mm', 'give how far the spring is compressed at full extension', {}),
    family: string()
      // Yup's trim() calls .trim() on whatever it is given, so a list or an object sent here threw
      // past the field errors; only text is trimmed, and anything else is refused as not text.
      .transform((value: unknown) => (typeof value === 'string' ? value.trim() : value))
      .typeError("Spring family must be text: give the spring's size family so the catalogue can match it.")
      .required("Spring family is missing: give the spring's size family so the catalogue can match it.")
      .max(60, 'Spring family must be at most 60 characters.'),
    springType: springTypeSchema(endName),
    adjuster: adjusterSchema,
    readings: readingsSchema,
    target: targetSchema,
  };
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

type Report = (field: string, message: string) => void;

/** Checks that need the end's travel beside its readings and targets. */
function checkEndAgainstTravel(context: TestContext, end: Record<string, unknown>, travel: number | undefined): true | ValidationError {
  const errors: ValidationError[] = [];
  const at: Report = (field, message) => errors.push(context.createError({ path: `${context.path}.${field}`, message }));
  if (end.secondRateNmm != null && end.breakMm == null) at('breakMm', 'A second rate needs its break point: give the spring compression where it starts.');
  if (end.breakMm != null && end.secondRateNmm == null) at('secondRateNmm', 'A break point needs the second rate: give the rate above it.');

  const readings = end.readings as Record<string, unknown> | undefined;
  if (readings) checkReadingOrder(readings, travel, at);

  const target = end.target as Record<string, unknown> | undefined;
  if (target) {
    const rider = within(target.riderSagMm, TARGET_SAG_MM, true) ? target.riderSagMm : undefined;
    const stat = within(target.staticSagMm, TARGET_SAG_MM) ? target.staticSagMm : undefined;
    if (rider !== undefined && travel !== undefined && rider > travel) at('target.riderSagMm', 'The target rider sag is more than the travel: lower it.');
    if (rider !== undefined && stat !== undefined && stat >= rider) at('target.staticSagMm', 'The target static sag must be less than the target rider sag.');
  }
  return errors.length === 0 ? true : new ValidationError(errors);
}

/**
 * L0 >= L1 >= L2 and the sags within the travel, judged only on readings that passed their own
 * checks, and with the float noise of a mean allowed for (500.2 and 500.4 average to
 * 500.29999999999995, which is 500.3).
 */
function checkReadingOrder(readings: Record<string, unknown>, travel: number | undefined, at: Report): void {
  if (!isLength(readings.extendedMm)) return;
  const l0 = readings.extendedMm;
  const l1 = checkLoadedReading(readings.staticMm, 'staticMm', l0, at);
  const l2 = checkLoadedReading(readings.riderMm, 'riderMm', l0, at);
  if (l1 !== undefined && travel !== undefined && l0 - l1 > travel + SAME_LENGTH_MM) {
    at('readings.staticMm', 'The static sag is more than the travel: re-measure the static and extended lengths, and check the travel.');
  }
  if (l2 === undefined) return;
  if (l1 !== undefined && l2 > l1 + SAME_LENGTH_MM) {
    at('readings.riderMm', 'The rider length is longer than the static length: re-measure with the rider aboard in riding position.');
  } else if (travel !== undefined && l0 - l2 > travel + SAME_LENGTH_MM) {
    at('readings.riderMm', 'The rider sag is more than the travel: re-measure the rider and extended lengths, and check the travel.');
  }
}

const LOADED = {
  staticMm: { name: 'static', longer: 'The static length is longer than the extended length: re-measure both between the same two marks, the extended one with the wheel off the ground.' },
  riderMm: { name: 'rider', longer: 'The rider length is longer than the extended length: re-measure both between the same two marks, the extended one with the wheel off the ground.' },
} as const;

/**
 * The mean of a loaded reading that is a length no longer than L0, or undefined after reporting
 * why not. Each of a pushed and lifted pair is held to L0 on its own: friction can hold an end
 * short of its rest, never beyond full extension.
 */
function checkLoadedReading(reading: unknown, field: keyof typeof LOADED, l0: number, at: Report): number | undefined {
  const { name, longer } = LOADED[field];
  if (isLength(reading)) {
    if (reading <= l0 + SAME_LENGTH_MM) return reading;
    at(`readings.${field}`, longer);
    return undefined;
  }
  if (!reading || typeof reading !== 'object') return undefined;
  const { pushedMm, liftedMm } = reading as { pushedMm?: unknown; liftedMm?: unknown };
  if (!isLength(pushedMm) || !isLength(liftedMm)) return undefined;
  const sides = [
    ['pushedMm', pushedMm, 'after pushing down'],
    ['liftedMm', liftedMm, 'after lifting'],
  ] as const;
  let fits = true;
  for (const [side, length, words] of sides) {
    if (length > l0 + SAME_LENGTH_MM) {
      at(`readings.${field}.${side}`, `The ${name} length ${words} is longer than the extended length, which a loaded reading cannot be: re-measure it, and the extended one with the wheel off the ground.`);
      fits = false;
    }
  }
  return fits ? (pushedMm + liftedMm) / 2 : undefined;
}

const frontSchema = object({
  travelMm: quantity('Fork travel', FRONT_TRAVEL_MM, ' mm', 'give the travel along the fork axis, from the manual or measured'),
  springCount: number()
    .transform(readTyped)
    .typeError('Sprung legs must be 1 or 2: count the fork legs that hold a spring.')
    .required('Sprung legs is missing: count the fork legs that hold a spring (1 or 2).')
    .oneOf([1, 2], 'Sprung legs must be 1 or 2: count the fork legs that hold a spring.'),
  rakeDeg: quantity('Rake', [0, 45], ' degrees', "give the fork's angle from vertical, from the manual"),
  ...commonEndFields('fork', FORK_RATE_NMM),
})
  .default(undefined)
  .nonNullable("The front end must give the fork's travel, spring and adjuster, or be left out.")
  .test('front-travel', function (front) {
    if (!front) return true;
    return checkEndAgainstTravel(this, front, within(front.travelMm, FRONT_TRAVEL_MM) ? front.travelMm : undefined);
  });

const rearSchema = object({
  wheelTravelMm: quantity('Rear wheel travel', REAR_TRAVEL_MM, ' mm', 'give the vertical travel of the rear axle, from the manual or measured'),
  shockStrokeMm: quantity('Shock stroke', STROKE_MM, ' mm', 'give the shock\'s travel from full extension to its bump stop'),
  gasForceN: quantity('Gas force', [0, 2000], ' N', "give the shock's gas force (pressure times rod area), or leave it out", {
    optional: true,
  }),
  linkage: array()
    .transform(readLinkagePoints)
    .default(undefined)
    .nonNullable('The linkage curve must be a list of [wheel mm, shock mm] points, or left out for a constant leverage ratio.')
    .typeError('The linkage curve must be a list of [wheel mm, shock mm] points.'),
  ...commonEndFields('shock', SHOCK_RATE_NMM),
})
  .default(undefined)
  .nonNullable("The rear end must give the shock's travel, stroke, spring and adjuster, or be left out.")
  .test('rear-travel', function (rear) {
    if (!rear) return true;
    const errors: ValidationError[] = [];
    const travel = within(rear.wheelTravelMm, REAR_TRAVEL_MM) ? rear.wheelTravelMm : undefined;
    const stroke = within(rear.shockStrokeMm, STROKE_MM) ? rear.shockStrokeMm : undefined;
    const travelCheck = checkEndAgainstTravel(this, rear, travel);
    if (travelCheck !== true) errors.push(travelCheck);
    if (travel !== undefined && stroke !== undefined && (travel / stroke < 0.5 || travel / stroke > 6)) {
      errors.push(
        this.createError({
          path: `${this.path}.shockStrokeMm`,
          message: `Wheel travel over shock stroke gives a leverage ratio of ${(travel / stroke).toFixed(2)}, outside 0.5 to 6: re-check the travel and the stroke.`,
        }),
      );
    }
    if (Array.isArray(rear.linkage)) {
      const problem = findLinkageProblem(rear.linkage, travel, stroke);
      if (problem) errors.push(this.createError({ path: `${this.path}.linkage${problem.at}`, message: problem.message }));
    }
    return errors.length === 0 ? true : new ValidationError(errors);
  });

/** Linkage numbers typed as text go through the decimal-comma parser like every other number. */
function readLinkagePoints(value: unknown): unknown {
  if (!Array.isArray(value)) return value;
  return value.map((point: unknown) =>
    Array.isArray(point) ? point.map((v: unknown) => (typeof v === 'string' ? (parseUserNumber(v) ?? v) : v)) : point,
  );
}

/**
 * How far the last point may sit from [travel, stroke], as a share of each: both are read off a
 * tape, and the engine takes the stated travel as the end of the curve.
 */
const LINKAGE_END_TOLERANCE = 0.01;

function findLinkageProblem(points: unknown[], travel: number | undefined, stroke: number | undefined): { at: string; message: string } | null {
  if (points.length < 2 || points.length > 60) {
    return { at: '', message: 'The linkage curve needs 2 to 60 points of [wheel mm, shock mm].' };
  }
  for (let i = 0; i < points.length; i++) {
    const point = points[i];
    if (!Array.isArray(point) || point.length !== 2 || !isNum(point[0]) || !isNum(point[1])) {
      return { at: `[${i}]`, message: `Linkage point ${i + 1} must be two numbers: wheel travel and shock compression in mm.` };
    }
  }
  const pairs = points as [number, number][];
  if (pairs[0][0] !== 0 || pairs[0][1] !== 0) {
    return { at: '[0]', message: 'The linkage curve must start at [0, 0], full extension.' };
  }
  for (let i = 1; i < pairs.length; i++) {
    if (!(pairs[i][0] > pairs[i - 1][0]) || !(pairs[i][1] > pairs[i - 1][1])) {
      return {
        at: `[${i}]`,
        message: `Linkage point ${i + 1} does not go further than the one before it: both wheel and shock travel must increase; re-measure it.`,
      };
    }
  }
  const last = pairs[pairs.length - 1];
  const off = (value: number, full: number) => Math.abs(value - full) > LINKAGE_END_TOLERANCE * full;
  if (travel !== undefined && stroke !== undefined && (off(last[0], travel) || off(last[1], stroke))) {
    return {
      at: `[${pairs.length - 1}]`,
      message: `The linkage curve must end at the full travel, [${travel}, ${stroke}], to within 1 %: re-measure the last point or check the travel and stroke.`,
    };
  }
  return null;
}

const bikeSchema = object({
  massKg: quantity('Bike wet mass', BIKE_KG, ' kg', 'weigh the bike as ridden, with fuel and oil'),
  frontShare: quantity('Front weight share', SHARE, '', "give the fraction of the bike's weight on the front wheel, e.g. 0.5"),
  unsprungFrontKg: quantity('Unsprung front mass', UNSPRUNG_KG, ' kg', 'give the mass of the front wheel, tyre, brakes and fork lowers'),
  unsprungRearKg: quantity('Unsprung rear mass', UNSPRUNG_KG, ' kg', 'give the mass of the rear wheel, tyre, brake and the swingarm share'),
})
  .default(undefined)
  .required('The bike is missing: give its mass and weight shares.')
  .test('sprung-mass', function (bike) {
    if (!bike || !within(bike.massKg, BIKE_KG) || !within(bike.frontShare, SHARE)) return true;
    const errors: ValidationError[] = [];
    if (within(bike.unsprungFrontKg, UNSPRUNG_KG) && bike.unsprungFrontKg >= bike.massKg * bike.frontShare) {
      errors.push(this.createError({ path: `${this.path}.unsprungFrontKg`, message: "The unsprung front mass is as much as the bike's weight on the front wheel: re-check it and the front share." }));
    }
    if (within(bike.unsprungRearKg, UNSPRUNG_KG) && bike.unsprungRearKg >= bike.massKg * (1 - bike.frontShare)) {
      errors.push(this.createError({ path: `${this.path}.unsprungRearKg`, message: "The unsprung rear mass is as much as the bike's weight on the rear wheel: re-check it and the front share." }));
    }
    return errors.length === 0 ? true : new ValidationError(errors);
  });

const riderSchema = object({
  bodyKg: quantity('Rider body mass', [20, 300], ' kg', 'weigh the rider without gear'),
  gearKg: quantity('Gear mass', [0, 80], ' kg', 'weigh helmet, jacket, boots, protector and pack, or give 0'),
  rearShare: quantity("Rider's rear share", [0, 1], '', "give the fraction of the rider's weight on the rear wheel, e.g. 0.65"),
})
  .default(undefined)
  .required('The rider is missing: give the rider and gear masses.');

/** At most this many load cases: solo is always sized, and a handful of others is what a rider keeps. */
const MAX_LOAD_CASES = 6;

const loadCaseSchema = object({
  name: string()
    .transform((value: unknown) => (typeof value === 'string' ? value.trim() : value))
    .typeError('A load case needs a name, as text.')
    .required('A load case needs a name, such as "With passenger".')
    .max(40, 'A load case name must be at most 40 characters.'),
  massKg: quantity('Load case mass', [0, 300], ' kg', 'give the mass of the passenger or luggage it adds', { aboveMin: true }),
  rearShare: quantity('Load case rear share', [0, 1.5], '', 'give the fraction on the rear wheel: about 0.9 to 1 for a passenger, 1.1 to 1.3 for a top box', {
    optional: true,
  }),
});

const loadCasesSchema = array()
  .of(loadCaseSchema)
  .default(undefined)
  .nonNullable('Load cases must be a list, or left out.')
  .typeError('Load cases must be a list of { name, massKg, rearShare }.')
  .max(MAX_LOAD_CASES, `Give at most ${MAX_LOAD_CASES} load cases.`)
  .test('distinct-names', function (cases) {
    if (!Array.isArray(cases)) return true;
    const seen = new Set<string>();
    for (let i = 0; i < cases.length; i++) {
      const name = typeof cases[i]?.name === 'string' ? cases[i].name.toLowerCase() : null;
      if (name === null) continue;
      if (seen.has(name)) return this.createError({ path: `${this.path}[${i}].name`, message: 'Each load case needs a name of its own.' });
      seen.add(name);
    }
    return true;
  });

export const sizingRequestSchema = object({
  discipline: string()
    .required("The riding discipline is missing: choose a profile such as 'road'.")
    .matches(/^[a-z][a-z0-9]*(-[a-z0-9]+)*$/, "Discipline must be a profile name in lower case, like 'road' or 'touring'.")
    .max(40, 'Discipline must be at most 40 characters.'),
  bike: bikeSchema,
  rider: riderSchema,
  front: frontSchema,
  rear: rearSchema,
  loadCases: loadCasesSchema,
  dampingRatio: quantity('Damping ratio', [0, 3], '', 'give the ride damping ratio to preview, about 0.2 to 0.5, or leave it out', {
    aboveMin: true,
    optional: true,
  }),
})
  .required('The request body is missing: send the bike, the rider and at least one end.')
  .typeError('The request body must be an object with the bike, the rider and at least one end.')
  .test('one-end', function (body) {
    if (!body || body.front || body.rear) return true;
    return this.createError({ path: 'ends', message: 'Give the front, the rear or both ends to size.' });
  });

export type SizingValidation = { ok: true; value: SizingRequest } | { ok: false; fields: Record<string, string> };

/** One message per bad field path, e.g. "front.readings.staticMm"; a missing end under "ends", the body as a whole under "". */
export function validateSizingRequest(body: unknown): SizingValidation {
  try {
    const value = sizingRequestSchema.validateSync(body, { abortEarly: false, stripUnknown: true });
    return { ok: true, value: value as unknown as SizingRequest };
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    return { ok: false, fields: toFieldErrors(error) };
  }
}
