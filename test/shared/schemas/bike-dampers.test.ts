/**
 * The damping adjusters of a bike's end and of a setup change. The limits are the product's own
 * (shared/schemas/bike.fields.ts: fully open at most 100 clicks or 20 turns, a dyno figure at most
 * 100,000 N s/m; common practice, no source); whole clicks and quarter turns are how adjusters are
 * set (shared/damping/adjuster-range.ts, common practice, no source). Bikes are the demo's invented models.
 */
import { ValidationError } from 'yup';
import { bikeSpecSchema } from '@shared/schemas/bike.schema';
import { toFieldErrors } from '@shared/schemas/field-errors';
import { setupChangeSchema } from '@shared/schemas/setup-log.schema';
import type { BikeSpec } from '@shared/types/bike';
import type { DamperAdjuster } from '@shared/types/damping';
import { DEMO_BIKE_MODELS } from '../../../server/seed/demo-bike-models';

async function fieldsOf(schema: { validate: (v: unknown, o: object) => Promise<unknown> }, value: unknown) {
  try {
    await schema.validate(value, { abortEarly: false, stripUnknown: true });
    return {};
  } catch (err) {
    if (err instanceof ValidationError) return toFieldErrors(err);
    throw err;
  }
}

/** An adjuster in clicks at 10 of 20, its standard 10, unless overridden. */
const damper = (kind: string, overrides: Partial<DamperAdjuster> = {}): DamperAdjuster => ({
  kind,
  unit: 'clicks',
  maxPosition: 20,
  standard: 10,
  position: 10,
  dampingPerStepNsPerM: null,
  ...overrides,
});

/** The invented sport model with the front end's adjusters replaced. */
function withFront(dampers: unknown, rear?: unknown): Record<string, unknown> {
  const bike = structuredClone(DEMO_BIKE_MODELS[3]) as unknown as Record<string, Record<string, unknown>>;
  bike.front.dampers = dampers;
  if (rear !== undefined) bike.rear.dampers = rear;
  return bike;
}

describe("a bike end's damping adjusters", () => {
  test('clicks and quarter turns within range pass, with or without a standard and a dyno figure', async () => {
    const dampers = [
      damper('rebound', { maxPosition: 100, standard: 0, position: 100, dampingPerStepNsPerM: 100_000 }),
      damper('hs-compression', { unit: 'turns', maxPosition: 20, standard: null, position: 0.25 }),
      damper('ls-compression', { unit: 'turns', maxPosition: 2.75, standard: 1.5, position: 2.75 }),
    ];
    expect(await fieldsOf(bikeSpecSchema, withFront(dampers))).toEqual({});
  });

  test('left out or null, an end has none', async () => {
    const { dampers: _front, ...front } = DEMO_BIKE_MODELS[3].front!;
    const value = (await bikeSpecSchema.validate({ ...DEMO_BIKE_MODELS[3], front, rear: { ...DEMO_BIKE_MODELS[3].rear!, dampers: null } })) as unknown as BikeSpec;
    expect([value.front?.dampers, value.rear?.dampers]).toEqual([[], []]);
  });

  test('each bad value is refused on its own path', async () => {
    const fields = await fieldsOf(
      bikeSpecSchema,
      withFront([
        damper('Rebound'),
        damper('compression', { unit: 'notches' as never }),
        damper('hs-compression', { maxPosition: 0 }),
        damper('ls-compression', { unit: 'turns', maxPosition: 25, standard: null, position: 1 }),
        damper('hs-rebound', { unit: 'turns', maxPosition: 2.3, standard: null, position: 1 }),
        damper('ls-rebound', { standard: 21, position: 10.5, dampingPerStepNsPerM: 0 }),
        damper('mid-valve', { maxPosition: 101, position: 'lots' as never, dampingPerStepNsPerM: 100_001 }),
      ]),
    );
    expect(fields).toEqual({
      'front.dampers[0].kind': 'An adjuster kind is lower-case letters, digits and "-", starting with a letter, at most 40 characters (e.g. hs-compression).',
      'front.dampers[1].unit': 'Count it in clicks or turns.',
      'front.dampers[2].maxPosition': 'Fully open must be above 0 and at most 100.',
      'front.dampers[3].maxPosition': 'Fully open is at most 20 turns out.',
      'front.dampers[4].maxPosition': 'Count fully open in quarter turns (0.25, 0.5, 0.75).',
      'front.dampers[5].standard': 'The setting must be from 0 (fully closed) to 20 clicks out (fully open).',
      'front.dampers[5].position': 'Set whole clicks.',
      'front.dampers[5].dampingPerStepNsPerM': 'Damping per step must be above 0 and at most 100000 N s/m.',
      'front.dampers[6].maxPosition': 'Fully open must be above 0 and at most 100.',
      'front.dampers[6].position': 'Set now must be a number.',
      'front.dampers[6].dampingPerStepNsPerM': 'Damping per step must be above 0 and at most 100000 N s/m.',
    });
  });

  test('a setting is judged against its own adjuster: quarter turns in turns, within fully open', async () => {
    const fields = await fieldsOf(
      bikeSpecSchema,
      withFront([damper('rebound', { unit: 'turns', maxPosition: 3, standard: 3.25, position: 1.1 })]),
    );
    expect(fields).toEqual({
      'front.dampers[0].standard': 'The setting must be from 0 (fully closed) to 3 turns out (fully open).',
      'front.dampers[0].position': 'Set turns in quarter turns (0.25, 0.5, 0.75).',
    });
  });

  test('each kind once per end: the second is refused by name, the other end may have it too', async () => {
    const fields = await fieldsOf(bikeSpecSchema, withFront([damper('rebound'), damper('hs-compression'), damper('hs-compression', { position: 4 })], [damper('hs-compression')]));
    expect(fields).toEqual({ 'front.dampers[2].kind': 'The hs-compression adjuster is listed twice: keep one.' });
  });

  test('the list is a list', async () => {
    expect(await fieldsOf(bikeSpecSchema, withFront({ rebound: 10 }))).toEqual({ 'front.dampers': 'The damping adjusters must be given as a list.' });
    expect(Object.keys(await fieldsOf(bikeSpecSchema, withFront([null, 'rebound'])))).toEqual(['front.dampers[0]', 'front.dampers[1]']);
  });
});

describe("a setup change's damping adjusters", () => {
  test('settings by kind pass; whether the bike has them is for applySetupChange', async () => {
    expect(await fieldsOf(setupChangeSchema, { front: { dampers: { rebound: 12, 'hs-compression': 1.25 } } })).toEqual({});
  });

  test('a bad key or setting is refused under its kind', async () => {
    const fields = await fieldsOf(setupChangeSchema, { front: { dampers: { 'Bad key': 3, compression: '4', rebound: 101, 'ls-rebound': -1 } } });
    expect(fields).toEqual({
      'front.dampers.Bad key': 'An adjuster kind is lower-case letters, digits and "-", starting with a letter, at most 40 characters (e.g. hs-compression).',
      'front.dampers.compression': 'The setting must be a number, out from fully closed.',
      'front.dampers.rebound': 'The setting must be between 0 and 100, out from fully closed.',
      'front.dampers.ls-rebound': 'The setting must be between 0 and 100, out from fully closed.',
    });
    expect(await fieldsOf(setupChangeSchema, { rear: { dampers: [12] } })).toEqual({ 'rear.dampers': 'Give the damping adjusters as { kind: setting }, e.g. { "rebound": 12 }.' });
  });

  test('no settings at all is no change', async () => {
    expect(Object.keys(await fieldsOf(setupChangeSchema, { front: { dampers: {} } }))).toEqual(['']);
  });
});
