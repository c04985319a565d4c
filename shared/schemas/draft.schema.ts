/**
 * The measuring flow's draft (PUT /api/bikes/:id/draft): the step the rider is at and the answers so
 * far. Lenient: anything may still be missing, but each value given must be a plausible length, and
 * the lengths given must be in order (extended >= static >= rider) with sags inside the travel.
 * The travel of each end comes in the validation context, `{ travelMm: { front, rear } }`.
 */

import { array, boolean, lazy, mixed, object, type TestContext, ValidationError } from 'yup';
import { averageReading } from '../sizing/readings';
import { MEASURING_STEPS, type DraftLengthReading, type MeasuringStep } from '../types/garage';
import type { EndKind } from '../types/sizing';
import { optionalNumberField } from './number-field';

export interface DraftContext {
  travelMm?: Partial<Record<EndKind, number>>;
}

const LENGTH_RANGE = { min: 0, max: 2000, aboveMin: true };

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null;

function loadedReading(label: string) {
  return lazy((value: unknown) =>
    isObject(value)
      ? object({
          pushedMm: optionalNumberField(`${label} after pushing down`, LENGTH_RANGE, 'mm'),
          liftedMm: optionalNumberField(`${label} after lifting`, LENGTH_RANGE, 'mm'),
        })
      : optionalNumberField(label, LENGTH_RANGE, 'mm'),
  );
}

const isLength = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value) && value > 0;

/** The length a reading stands for so far: the mean of a complete pair, or the one value there is. */
function representative(reading: DraftLengthReading | undefined): number | undefined {
  if (isLength(reading)) return reading;
  if (!isObject(reading)) return undefined;
  const { pushedMm, liftedMm } = reading;
  if (isLength(pushedMm) && isLength(liftedMm)) return averageReading({ pushedMm, liftedMm });
  return isLength(pushedMm) ? pushedMm : isLength(liftedMm) ? liftedMm : undefined;
}

function checkOrder(context: TestContext, end: EndKind, readings: Record<string, unknown>): true | ValidationError {
  const travel = (context.options.context as DraftContext | undefined)?.travelMm?.[end];
  const l0 = isLength(readings.extendedMm) ? readings.extendedMm : undefined;
  const l1 = representative(readings.staticMm as DraftLengthReading | undefined);
  const l2 = representative(readings.riderMm as DraftLengthReading | undefined);
  const errors: ValidationError[] = [];
  const at = (field: string, message: string) => errors.push(context.createError({ path: `${context.path}.${field}`, message }));
  if (l0 !== undefined && l1 !== undefined && l1 > l0) {
    at('staticMm', 'The static length is longer than the extended length: re-measure both between the same two marks, the extended one with the wheel off the ground.');
  } else if (l0 !== undefined && l1 !== undefined && travel !== undefined && l0 - l1 > travel) {
    at('staticMm', 'The static sag is more than the travel: re-measure the static and extended lengths.');
  }
  const above = l1 ?? l0;
  if (l2 !== undefined && above !== undefined && l2 > above) {
    at('riderMm', `The rider length is longer than the ${l1 !== undefined ? 'static' : 'extended'} length: re-measure with the rider aboard in riding position.`);
  } else if (l0 !== undefined && l2 !== undefined && travel !== undefined && l0 - l2 > travel) {
    at('riderMm', 'The rider sag is more than the travel: re-measure the rider and extended lengths.');
  }
  return errors.length === 0 ? true : new ValidationError(errors);
}

function draftEndSchema(end: EndKind) {
  return object({
    extendedMm: optionalNumberField('Extended length', LENGTH_RANGE, 'mm'),
    staticMm: loadedReading('Static length'),
    riderMm: loadedReading('Rider length'),
  })
    .default(undefined)
    .typeError(`The ${end} readings must be given as extended, static and rider lengths.`)
    .test('reading-order', function (readings) {
      return readings ? checkOrder(this, end, readings) : true;
    });
}

export const draftAnswersSchema = object({
  weighInConfirmed: boolean().optional().typeError('Say whether the weigh-in is confirmed.'),
  ends: array()
    .of(mixed<EndKind>().required().oneOf(['front', 'rear'], 'Choose the front, the rear or both.'))
    .optional()
    .max(2, 'Choose the front, the rear or both.')
    .test('unique-ends', 'Choose each end once.', (ends) => !ends || new Set(ends).size === ends.length)
    .typeError('Choose the front, the rear or both.'),
  front: draftEndSchema('front'),
  rear: draftEndSchema('rear'),
})
  .default(() => ({}))
  .typeError('The answers must be an object.');

export const draftSaveSchema = object({
  step: mixed<MeasuringStep>().required('Say which step the flow is at.').oneOf(MEASURING_STEPS, 'That is not a step of the measuring flow.'),
  answers: draftAnswersSchema,
}).typeError('Send the draft as { step, answers }.');

/** POST /api/bikes/:id/draft: a fresh draft; `remeasure` prefills the hints from the last saved pass. */
export const draftStartSchema = object({
  remeasure: boolean().default(false).typeError('Say whether this is a re-measure (true or false).'),
}).typeError('Send { remeasure } or nothing.');
