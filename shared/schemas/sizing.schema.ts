/**
 * The body of POST /api/sizing, one schema for the client's forms and the server. Each message
 * says in plain words what to re-measure or fix. Numbers may be typed with a decimal comma.
 */

import { array, lazy, mixed, number, object, string, ValidationError, type TestContext } from 'yup';
import type { SizingRequest } from '../types/sizing';
import { toFieldErrors } from './field-errors';
import { parseUserNumber } from '../units/parse-number';

type Bounds = [number, number];

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

function quantity(label: string, [min, max]: Bounds, unit: string, fix: string, options: QuantityOptions = {}) {
  const range = `${label} must be ${options.aboveMin ? 'above' : 'between'} ${min}${options.aboveMin ? ` and at most` : ' and'} ${max}${unit}: ${fix}.`;
  const base = number()
    .transform(readTyped)
    .typeError(`${label} must be a number: ${fix}.`)
    .max(max, range);
  const bounded = options.aboveMin ? base.moreThan(min, range) : base.min(min, range);
  return options.optional ? bounded.optional() : bounded.required(`${label} is missing: ${fix}.`);
}

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function meanOf(reading: unknown): number | undefined {
  if (isNum(reading)) return reading;
  if (reading && typeof reading === 'object') {
    const { pushedMm, liftedMm } = reading as { pushedMm?: unknown; liftedMm?: unknown };
    if (isNum(pushedMm) && isNum(liftedMm)) return (pushedMm + liftedMm) / 2;
  }
  return undefined;
}

const LENGTH_FIX = 'measure between the same two marks as the other readings, in mm';

function loadedReading(label: string) {
  return lazy((value: unknown) =>
    value !== null && typeof value === 'object'
      ? object({
          pushedMm: quantity(`${label} after pushing down`, [0, 2000], ' mm', LENGTH_FIX, { aboveMin: true }),
          liftedMm: quantity(`${label} after lifting`, [0, 2000], ' mm', LENGTH_FIX, { aboveMin: true }),
        })
      : quantity(label, [0, 2000], ' mm', LENGTH_FIX, { aboveMin: true }),
  );
}

const readingsSchema = object({
  extendedMm: quantity('Extended length', [0, 2000], ' mm', 'measure it with the wheel off the ground, fully extended', {
    aboveMin: true,
  }),
  staticMm: loadedReading('Static length'),
  riderMm: loadedReading('Rider length'),
}).default(undefined);

const targetSchema = object({
  riderSagMm: quantity('Target rider sag', [0, 400], ' mm', 'give the rider sag to aim at, or leave the target out', {
    aboveMin: true,
  }),
  staticSagMm: quantity('Target static sag', [0, 400], ' mm', 'give the static sag to aim at, or leave the target out'),
}).default(undefined);

const adjusterSchema = object({
  kind: string()
    .required('Adjuster kind is missing: choose threaded, stepped or spacer.')
    .oneOf(['threaded', 'stepped', 'spacer'], 'Adjuster kind must be threaded, stepped or spacer.'),
  mmPerUnit: quantity('Preload per adjuster unit', [0, 50], ' mm', 'give the thread pitch (mm per turn), the mm per step, or 1 for a spacer', {
    aboveMin: true,
  }),
  position: quantity('Adjuster setting', [-1000, 1000], '', "count the current setting from the adjuster's zero"),
  maxPosition: quantity('Adjuster maximum', [-1000, 1000], '', 'give the highest setting the adjuster reaches'),
  minPosition: quantity('Adjuster minimum', [-1000, 1000], '', 'give the lowest setting, or leave it out for 0', {
    optional: true,
  }),
})
  .default(undefined)
  .required('The preload adjuster is missing: say whether it is threaded, stepped or a spacer.')
  .test('adjuster-range', function (adjuster) {
    if (!adjuster) return true;
    const min = isNum(adjuster.minPosition) ? adjuster.minPosition : 0;
    if (isNum(adjuster.maxPosition) && adjuster.maxPosition <= min) {
      return this.createError({
        path: `${this.path}.maxPosition`,
        message: "The adjuster's maximum must be above its minimum: check both settings.",
      });
    }
    if (isNum(adjuster.position) && isNum(adjuster.maxPosition) && (adjuster.position < min || adjuster.position > adjuster.maxPosition)) {
      return this.createError({
        path: `${this.path}.position`,
        message: "The current setting lies outside the adjuster's range: re-count it from the adjuster's zero.",
      });
    }
    return true;
  });

function springTypeSchema(endName: string) {
  return mixed().test('coil-only', function (value) {
    if (value === undefined || value === null || value === 'coil') return true;
    if (value === 'air') {
      return this.createError({
        message: `An air-sprung ${endName} cannot be sized here: this model sizes coil springs only. Set the air spring from its pressure chart instead.`,
      });
    }
    return this.createError({ message: "Spring type must be 'coil'." });
  });
}

function commonEndFields(endName: string, rateBounds: Bounds) {
  return {
    rateNmm: quantity(`${capitalise(endName)} spring rate`, rateBounds, ' N/mm', 'read it from the spring or its paperwork, in N/mm (1 kgf/mm is 9.81 N/mm)', {
      aboveMin: true,
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
      .trim()
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

/** Checks that need the end's travel beside its readings and targets. */
function checkEndAgainstTravel(context: TestContext, end: Record<string, unknown>, travel: unknown): true | ValidationError {
  const errors: ValidationError[] = [];
  const at = (field: string, message: string) => errors.push(context.createError({ path: `${context.path}.${field}`, message }));
  if (end.secondRateNmm != null && end.breakMm == null) at('breakMm', 'A second rate needs its break point: give the spring compression where it starts.');
  if (end.breakMm != null && end.secondRateNmm == null) at('secondRateNmm', 'A break point needs the second rate: give the rate above it.');

  const readings = end.readings as Record<string, unknown> | undefined;
  if (readings) {
    const l0 = readings.extendedMm;
    const l1 = meanOf(readings.staticMm);
    const l2 = meanOf(readings.riderMm);
    if (isNum(l0) && isNum(l1) && l1 > l0) {
      at('readings.staticMm', 'The static length is longer than the extended length: re-measure both between the same two marks, the extended one with the wheel off the ground.');
    } else if (isNum(l0) && isNum(l1) && isNum(travel) && l0 - l1 > travel) {
      at('readings.staticMm', 'The static sag is more than the travel: re-measure the static and extended lengths, and check the travel.');
    }
    if (isNum(l1) && isNum(l2) && l2 > l1) {
      at('readings.riderMm', 'The rider length is longer than the static length: re-measure with the rider aboard in riding position.');
    } else if (isNum(l0) && isNum(l2) && isNum(travel) && l0 - l2 > travel) {
      at('readings.riderMm', 'The rider sag is more than the travel: re-measure the rider and extended lengths, and check the travel.');
    }
  }

  const target = end.target as Record<string, unknown> | undefined;
  if (target) {
    const rider = target.riderSagMm;
    const stat = target.staticSagMm;
    if (isNum(rider) && isNum(travel) && rider > travel) at('target.riderSagMm', 'The target rider sag is more than the travel: lower it.');
    if (isNum(rider) && isNum(stat) && stat >= rider) at('target.staticSagMm', 'The target static sag must be less than the target rider sag.');
  }
  return errors.length === 0 ? true : new ValidationError(errors);
}

const frontSchema = object({
  travelMm: quantity('Fork travel', [30, 350], ' mm', 'give the travel along the fork axis, from the manual or measured'),
  springCount: number()
    .transform(readTyped)
    .typeError('Sprung legs must be 1 or 2: count the fork legs that hold a spring.')
    .required('Sprung legs is missing: count the fork legs that hold a spring (1 or 2).')
    .oneOf([1, 2], 'Sprung legs must be 1 or 2: count the fork legs that hold a spring.'),
  rakeDeg: quantity('Rake', [0, 45], ' degrees', "give the fork's angle from vertical, from the manual"),
  ...commonEndFields('fork', [0, 50]),
})
  .default(undefined)
  .test('front-travel', function (front) {
    return front ? checkEndAgainstTravel(this, front, front.travelMm) : true;
  });

const rearSchema = object({
  wheelTravelMm: quantity('Rear wheel travel', [30, 400], ' mm', 'give the vertical travel of the rear axle, from the manual or measured'),
  shockStrokeMm: quantity('Shock stroke', [10, 200], ' mm', 'give the shock\'s travel from full extension to its bump stop'),
  gasForceN: quantity('Gas force', [0, 2000], ' N', "give the shock's gas force (pressure times rod area), or leave it out", {
    optional: true,
  }),
  linkage: array().default(undefined).typeError('The linkage curve must be a list of [wheel mm, shock mm] points.'),
  ...commonEndFields('shock', [0, 500]),
})
  .default(undefined)
  .test('rear-travel', function (rear) {
    if (!rear) return true;
    const errors: ValidationError[] = [];
    const travelCheck = checkEndAgainstTravel(this, rear, rear.wheelTravelMm);
    if (travelCheck !== true) errors.push(travelCheck);
    const { wheelTravelMm: travel, shockStrokeMm: stroke } = rear;
    if (isNum(travel) && isNum(stroke) && (travel / stroke < 0.5 || travel / stroke > 6)) {
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

function findLinkageProblem(points: unknown[], travel: unknown, stroke: unknown): { at: string; message: string } | null {
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
  if (isNum(travel) && isNum(stroke) && (Math.abs(last[0] - travel) > 0.5 || Math.abs(last[1] - stroke) > 0.5)) {
    return {
      at: `[${pairs.length - 1}]`,
      message: `The linkage curve must end at the full travel, [${travel}, ${stroke}]: re-measure the last point or check the travel and stroke.`,
    };
  }
  return null;
}

const bikeSchema = object({
  massKg: quantity('Bike wet mass', [30, 700], ' kg', 'weigh the bike as ridden, with fuel and oil'),
  frontShare: quantity('Front weight share', [0, 1], '', "give the fraction of the bike's weight on the front wheel, e.g. 0.5"),
  unsprungFrontKg: quantity('Unsprung front mass', [0, 150], ' kg', 'give the mass of the front wheel, tyre, brakes and fork lowers'),
  unsprungRearKg: quantity('Unsprung rear mass', [0, 150], ' kg', 'give the mass of the rear wheel, tyre, brake and the swingarm share'),
})
  .default(undefined)
  .required('The bike is missing: give its mass and weight shares.')
  .test('sprung-mass', function (bike) {
    if (!bike || !isNum(bike.massKg) || !isNum(bike.frontShare)) return true;
    const errors: ValidationError[] = [];
    if (isNum(bike.unsprungFrontKg) && bike.unsprungFrontKg >= bike.massKg * bike.frontShare) {
      errors.push(this.createError({ path: `${this.path}.unsprungFrontKg`, message: "The unsprung front mass is as much as the bike's weight on the front wheel: re-check it and the front share." }));
    }
    if (isNum(bike.unsprungRearKg) && bike.unsprungRearKg >= bike.massKg * (1 - bike.frontShare)) {
      errors.push(this.createError({ path: `${this.path}.unsprungRearKg`, message: "The unsprung rear mass is as much as the bike's weight on the rear wheel: re-check it and the front share." }));
    }
    return errors.length === 0 ? true : new ValidationError(errors);
  });

const riderSchema = object({
  bodyKg: quantity('Rider body mass', [20, 300], ' kg', 'weigh the rider without gear'),
  gearKg: quantity('Gear mass', [0, 80], ' kg', 'weigh helmet, jacket, boots, protector and pack, or give 0'),
  luggageKg: quantity('Luggage or passenger mass', [0, 300], ' kg', 'give what else rides along, or 0'),
  rearShare: quantity("Rider's rear share", [0, 1], '', "give the fraction of the rider's weight on the rear wheel, e.g. 0.65"),
  luggageRearShare: quantity('Luggage rear share', [0, 1.5], '', 'give the fraction on the rear wheel: about 0.9 to 1 for a passenger, 1.1 to 1.3 for a top box', {
    optional: true,
  }),
})
  .default(undefined)
  .required('The rider is missing: give the rider, gear and luggage masses.');

export const sizingRequestSchema = object({
  discipline: string()
    .required("The riding discipline is missing: choose a profile such as 'road'.")
    .matches(/^[a-z][a-z0-9]*(-[a-z0-9]+)*$/, "Discipline must be a profile name in lower case, like 'road' or 'two-up'.")
    .max(40, 'Discipline must be at most 40 characters.'),
  bike: bikeSchema,
  rider: riderSchema,
  front: frontSchema,
  rear: rearSchema,
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
