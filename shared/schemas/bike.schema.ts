/**
 * A bike's values, for the garage's forms, the shop's bike-model editor and the server. Ranges and
 * labels come from bike.fields.ts. On top of each field's own check, a bike must be one the sizing
 * engine accepts: the sizing request's own schema runs on it, so cross-field rules (leverage ratio,
 * linkage curve, adjuster range, unsprung mass against the weight share) are the engine's exactly.
 */

import { array, mixed, number, object, string, ValidationError, type TestContext } from 'yup';
import { checkDamperSetting, isWholeStep } from '../damping/adjuster-range';
import { PRELOAD_DIRECTIONS, type PreloadDirection } from '../types/bike';
import { DAMPER_UNITS, type DamperAdjuster, type DamperUnit } from '../types/damping';
import type { AdjusterKind, EndKind } from '../types/sizing';
import { bikeField, DAMPER_FIELDS, DAMPER_MAX_OPEN, DAMPING_PER_STEP_RANGE, MAX_DAMPERS_PER_END } from './bike.fields';
import { DAMPER_KIND_KEY, DAMPER_KIND_KEY_MESSAGE } from './damper-kind.schema';
import { nullableNumberField, numberField, optionalNumberField } from './number-field';
import { validateSizingRequest } from './sizing.schema';

function fieldFor(path: string) {
  const info = bikeField(path);
  if (!info.range) throw new Error(`${path} is not a number field`);
  return [info.label, info.range, info.siUnit] as const;
}

const num = (path: string) => numberField(...fieldFor(path));
const optionalNum = (path: string) => optionalNumberField(...fieldFor(path));
const nullableNum = (path: string) => nullableNumberField(...fieldFor(path));

const ADJUSTER_KINDS: readonly AdjusterKind[] = ['threaded', 'stepped', 'spacer'];

const isDamperUnit = (unit: unknown): unit is DamperUnit => (DAMPER_UNITS as readonly unknown[]).includes(unit);

/** An adjuster's settings are checked once its own unit and fully-open count are valid. */
function rangeOf(parent: unknown): Pick<DamperAdjuster, 'unit' | 'maxPosition'> | null {
  const { unit, maxPosition } = (parent ?? {}) as Partial<DamperAdjuster>;
  if (!isDamperUnit(unit) || typeof maxPosition !== 'number') return null;
  if (!(maxPosition > 0 && maxPosition <= DAMPER_MAX_OPEN[unit] && isWholeStep(unit, maxPosition))) return null;
  return { unit, maxPosition };
}

function settingTest(this: TestContext, value: number | null | undefined) {
  const range = rangeOf(this.parent);
  if (value === null || value === undefined || !range) return true;
  const problem = checkDamperSetting(range, value);
  return problem ? this.createError({ message: problem }) : true;
}

const damperSchema = object({
  kind: string()
    .required(`${DAMPER_FIELDS.kind.label} is missing: choose one from the list.`)
    .matches(DAMPER_KIND_KEY, DAMPER_KIND_KEY_MESSAGE),
  unit: mixed<DamperUnit>().required('Say whether it counts clicks or turns.').oneOf(DAMPER_UNITS, 'Count it in clicks or turns.'),
  maxPosition: numberField(DAMPER_FIELDS.maxPosition.label, { min: 0, max: DAMPER_MAX_OPEN.clicks, aboveMin: true }, '').test('open-range', function (value) {
    const unit = (this.parent as Partial<DamperAdjuster>).unit;
    if (value === undefined || !isDamperUnit(unit)) return true;
    if (value > DAMPER_MAX_OPEN[unit]) return this.createError({ message: `${DAMPER_FIELDS.maxPosition.label} is at most ${DAMPER_MAX_OPEN[unit]} ${unit} out.` });
    if (!isWholeStep(unit, value)) {
      return this.createError({ message: unit === 'clicks' ? 'Count fully open in whole clicks.' : 'Count fully open in quarter turns (0.25, 0.5, 0.75).' });
    }
    return true;
  }),
  standard: nullableNumberField(DAMPER_FIELDS.standard.label, { min: 0, max: DAMPER_MAX_OPEN.clicks }, '').test('standard-setting', settingTest),
  position: numberField(DAMPER_FIELDS.position.label, { min: 0, max: DAMPER_MAX_OPEN.clicks }, '').test('setting', settingTest),
  dampingPerStepNsPerM: nullableNumberField(DAMPER_FIELDS.dampingPerStepNsPerM.label, DAMPING_PER_STEP_RANGE, 'N s/m'),
})
  .default(undefined)
  .typeError('Each damping adjuster must be given as its values.')
  .required('Each damping adjuster must be given as its values.');

/** Each kind at most once per end: a repeat is refused on its own kind. */
const dampersSchema = array()
  .of(damperSchema)
  // An end sent with null for its adjusters has none.
  .transform((value: unknown) => (value === null ? [] : value))
  .default(() => [])
  .typeError('The damping adjusters must be given as a list.')
  .max(MAX_DAMPERS_PER_END, `An end has at most ${MAX_DAMPERS_PER_END} damping adjusters.`)
  .test('one-of-each', function (list) {
    const seen = new Set<string>();
    const errors: ValidationError[] = [];
    (list ?? []).forEach((damper, index) => {
      const kind = damper?.kind;
      if (!kind) return;
      if (seen.has(kind)) {
        errors.push(this.createError({ path: `${this.path}[${index}].kind`, message: `The ${kind} adjuster is listed twice: keep one.` }));
      }
      seen.add(kind);
    });
    return errors.length === 0 ? true : new ValidationError(errors);
  });

function adjusterSchema(end: EndKind) {
  const at = (field: string) => `${end}.adjuster.${field}`;
  return object({
    kind: string()
      .required('Preload adjuster is missing: choose threaded, stepped or spacer.')
      .oneOf(ADJUSTER_KINDS, 'Preload adjuster must be threaded, stepped or spacer.'),
    mmPerUnit: num(at('mmPerUnit')),
    position: num(at('position')),
    minPosition: optionalNum(at('minPosition')),
    maxPosition: num(at('maxPosition')),
    zeroReference: string().trim().max(120, 'Keep the adjuster zero to 120 characters.').default(''),
    addsPreload: mixed<PreloadDirection>()
      .required('Say which way adds preload.')
      .oneOf(PRELOAD_DIRECTIONS, 'Adds preload must be clockwise, counter-clockwise or longer spacer.'),
  })
    .default(undefined)
    .typeError('The preload adjuster must be given as its values.')
    .required('The preload adjuster is missing.')
    .test('adds-preload', function (adjuster) {
      if (!adjuster?.kind || !adjuster.addsPreload) return true;
      const spacer = adjuster.kind === 'spacer';
      if (spacer === (adjuster.addsPreload === 'longer spacer')) return true;
      return this.createError({
        path: `${this.path}.addsPreload`,
        message: spacer ? 'A spacer adds preload by being longer: choose longer spacer.' : 'Choose clockwise or counter-clockwise for a collar, cap or cam.',
      });
    });
}

function springFields(end: EndKind) {
  return {
    rateNmm: num(`${end}.rateNmm`),
    secondRateNmm: nullableNum(`${end}.secondRateNmm`),
    breakMm: nullableNum(`${end}.breakMm`),
    preloadMm: num(`${end}.preloadMm`),
    family: string()
      .trim()
      .required('Spring family is missing: give the spring’s size family, e.g. F43x290.')
      .max(60, 'Spring family must be at most 60 characters.'),
    adjuster: adjusterSchema(end),
    dampers: dampersSchema,
  };
}

export const frontSpecSchema = object({
  travelMm: num('front.travelMm'),
  springCount: number()
    .required('Sprung legs is missing: count the fork legs that hold a spring (1 or 2).')
    .typeError('Sprung legs must be 1 or 2.')
    .oneOf([1, 2], 'Sprung legs must be 1 or 2.'),
  rakeDeg: num('front.rakeDeg'),
  ...springFields('front'),
})
  .nullable()
  .default(null)
  .typeError('The fork must be given as its values, or null for none.');

const linkagePoint = array().of(number().typeError('A linkage point holds two numbers in mm.'));

export const rearSpecSchema = object({
  wheelTravelMm: num('rear.wheelTravelMm'),
  shockStrokeMm: num('rear.shockStrokeMm'),
  gasForceN: nullableNum('rear.gasForceN'),
  linkage: array()
    .of(linkagePoint)
    .nullable()
    .default(null)
    .typeError('The linkage curve must be a list of [wheel mm, shock mm] points.'),
  ...springFields('rear'),
})
  .nullable()
  .default(null)
  .typeError('The shock must be given as its values, or null for none.');

export const massesSchema = object({
  massKg: num('masses.massKg'),
  frontShare: num('masses.frontShare'),
  unsprungFrontKg: num('masses.unsprungFrontKg'),
  unsprungRearKg: num('masses.unsprungRearKg'),
})
  .default(undefined)
  .typeError('The bike’s masses must be given as their values.')
  .required('The bike’s masses are missing.');

/** Any valid rider: only the bike's own fields are judged through the sizing schema. */
const PLACEHOLDER_RIDER = { bodyKg: 80, gearKg: 8, luggageKg: 0, rearShare: 0.65 };

const isObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null;

/**
 * The sizing schema's messages for the bike's fields, under the bike's paths (its `bike.` is the
 * bike's `masses.`). The ends go in as they are: the sizing schema drops what only the garage keeps
 * (damping adjusters, the adjuster's zero), and reads a null as left out, except the linkage list's.
 */
export function checkSizeable(spec: { masses?: unknown; front?: unknown; rear?: unknown }): Record<string, string> {
  const rear = isObject(spec.rear) ? { ...spec.rear, linkage: spec.rear.linkage ?? undefined } : spec.rear;
  const checked = validateSizingRequest({
    discipline: 'road',
    bike: spec.masses,
    rider: PLACEHOLDER_RIDER,
    front: spec.front ?? undefined,
    rear: rear ?? undefined,
  });
  if (checked.ok) return {};
  const fields: Record<string, string> = {};
  for (const [path, message] of Object.entries(checked.fields)) {
    if (path.startsWith('bike.')) fields[`masses.${path.slice('bike.'.length)}`] = message;
    else if (path.startsWith('front') || path.startsWith('rear')) fields[path] = message;
  }
  return fields;
}

const specFields = { masses: massesSchema, front: frontSpecSchema, rear: rearSpecSchema };

/** A whole bike: masses and at least one end, sizeable as it stands. */
export const bikeSpecSchema = object(specFields)
  .typeError('Send the bike as an object of its values.')
  .test('one-end', function (spec) {
    if (!spec || spec.front || spec.rear) return true;
    return this.createError({ path: 'ends', message: 'Give the fork, the shock or both.' });
  })
  .test('sizeable', function (spec) {
    if (!spec || (!spec.front && !spec.rear)) return true;
    const fields = checkSizeable(spec);
    const errors = Object.entries(fields).map(([path, message]) => this.createError({ path, message }));
    return errors.length === 0 ? true : new ValidationError(errors);
  });

const nickname = string().trim().required('Give the bike a nickname.').max(60, 'Keep the nickname to 60 characters.');

/**
 * POST /api/bikes. From a shop model (`modelId`): each part left out (`masses`, `front`, `rear`) is
 * copied from the model, a part given replaces it, and `null` leaves that end out. By hand: masses
 * and at least one end. Desk and admin may give `riderId` to put the bike in a customer's garage.
 */
export const bikeCreateSchema = object({
  modelId: number().integer('Choose a bike model from the list.').positive('Choose a bike model from the list.').optional(),
  riderId: number().integer('Choose a rider.').positive('Choose a rider.').optional(),
  nickname,
  masses: object(massesSchema.fields).default(undefined).optional(),
  front: frontSpecSchema.default(undefined),
  rear: rearSpecSchema.default(undefined),
}).typeError('Send the bike as an object of its values.');

/** The bike's form, and PUT /api/bikes/:id: the nickname and the whole bike. */
export const bikeFormSchema = bikeSpecSchema.shape({ nickname });

/** POST and PUT /api/bike-models (admin). */
export const bikeModelSchema = bikeSpecSchema.shape({
  name: string().trim().required('Give the model a name.').max(80, 'Keep the name to 80 characters.'),
  description: string().trim().max(500, 'Keep the description to 500 characters.').default(''),
});
