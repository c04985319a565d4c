/**
 * The garage's schemas: the bike, the weigh-in, the draft, the setup change and the shop data
 * editors. Limits are the product's own (sizing.md section 1: L0 >= L1 >= L2, sags within travel).
 */
import { ValidationError } from 'yup';
import { bikeFormSchema, bikeSpecSchema } from '@shared/schemas/bike.schema';
import { draftSaveSchema } from '@shared/schemas/draft.schema';
import { toFieldErrors } from '@shared/schemas/field-errors';
import { setupChangeSchema } from '@shared/schemas/setup-log.schema';
import { checkEngineSettings, targetProfileUpdateSchema } from '@shared/schemas/shop-data.schema';
import { weighInSchema } from '@shared/schemas/weigh-in.schema';
import { engineSettingSeeds } from '../../../server/seed/sizing-defaults';
import { DEMO_BIKE_MODELS } from '../../../server/seed/demo-bike-models';

async function fieldsOf(schema: { validate: (v: unknown, o: object) => Promise<unknown> }, value: unknown, context?: object) {
  try {
    await schema.validate(value, { abortEarly: false, stripUnknown: true, context });
    return {};
  } catch (err) {
    if (err instanceof ValidationError) return toFieldErrors(err);
    throw err;
  }
}

const tarn = DEMO_BIKE_MODELS[0];

describe('bike', () => {
  test('the demo models pass', async () => {
    for (const model of DEMO_BIKE_MODELS) expect(await fieldsOf(bikeSpecSchema, model)).toEqual({});
  });

  test('a bad value is refused under its own path, typed text is read', async () => {
    const bad = structuredClone(tarn) as unknown as Record<string, any>;
    bad.masses.massKg = '700,5';
    bad.front.rakeDeg = 60;
    bad.front.adjuster.addsPreload = 'clockwise';
    // The demo shock's rebound opens 3 turns.
    bad.rear.dampers[0].position = 3.5;
    const fields = await fieldsOf(bikeSpecSchema, bad);
    expect(Object.keys(fields).sort()).toEqual(['front.adjuster.addsPreload', 'front.rakeDeg', 'masses.massKg', 'rear.dampers[0].position']);
    expect(fields['rear.dampers[0].position']).toBe('The setting must be from 0 (fully closed) to 3 turns out (fully open).');
    expect(fields['masses.massKg']).toBe('Bike wet mass must be between 30 and 700 kg.');
    expect(fields['front.rakeDeg']).toBe('Rake must be between 0 and 45 deg.');
  });

  test("the engine's cross-field rules come through: leverage ratio, linkage, unsprung mass", async () => {
    const bad = structuredClone(DEMO_BIKE_MODELS[2]) as unknown as Record<string, any>;
    bad.rear.linkage[2] = [100, 10];
    bad.masses.unsprungFrontKg = 80;
    const fields = await fieldsOf(bikeSpecSchema, bad);
    expect(fields['rear.linkage[2]']).toMatch(/does not go further/);
    expect(fields['masses.unsprungFrontKg']).toMatch(/as much as the bike's weight on the front/);
  });

  test('a bike needs one end at least, and a form a nickname', async () => {
    expect(await fieldsOf(bikeSpecSchema, { masses: tarn.masses, front: null, rear: null })).toEqual({ ends: 'Give the fork, the shock or both.' });
    expect(Object.keys(await fieldsOf(bikeFormSchema, { ...tarn, nickname: ' ' }))).toEqual(['nickname']);
  });
});

describe('weigh-in', () => {
  test('the rear shares come from the position and the kind of load when left out', async () => {
    const value = await weighInSchema.validate({ bodyKg: '82', gear: {}, loads: [{ kind: 'passenger', massKg: 70 }], discipline: 'touring', position: 'upright' });
    // weigh-in.fields.ts: upright 0.70, passenger 0.95 (from memory).
    expect(value.rearShare).toBe(0.7);
    expect(value.loads[0].rearShare).toBe(0.95);
  });

  test('each bad value is refused on its own', async () => {
    const fields = await fieldsOf(weighInSchema, { bodyKg: 10, gear: { helmet: 9 }, loads: [{ kind: 'cat', massKg: -1 }], discipline: 'Road', position: 'lying', rearShare: 2 });
    // An unknown kind of load has no typical share to fill in, so its share is missing too.
    expect(Object.keys(fields).sort()).toEqual(['bodyKg', 'discipline', 'gear.helmet', 'loads[0].kind', 'loads[0].massKg', 'loads[0].rearShare', 'position', 'rearShare']);
  });
});

describe('draft', () => {
  test('partial answers pass', async () => {
    expect(await fieldsOf(draftSaveSchema, { step: 'front-static', answers: { ends: ['front'], front: { extendedMm: 180, staticMm: { pushedMm: 158 } } } })).toEqual({});
    expect(await fieldsOf(draftSaveSchema, { step: 'weigh-in' })).toEqual({});
  });

  test('lengths out of order or beyond the travel are refused where they are', async () => {
    const context = { travelMm: { front: 120 } };
    const outOfOrder = await fieldsOf(draftSaveSchema, { step: 'front-rider', answers: { front: { extendedMm: 180, staticMm: 185, riderMm: 190 } } }, context);
    expect(Object.keys(outOfOrder).sort()).toEqual(['answers.front.riderMm', 'answers.front.staticMm']);
    // 180 - 50 = 130 mm of rider sag on a 120 mm travel.
    const beyond = await fieldsOf(draftSaveSchema, { step: 'front-rider', answers: { front: { extendedMm: 180, riderMm: 50 } } }, context);
    expect(Object.keys(beyond)).toEqual(['answers.front.riderMm']);
    const bad = await fieldsOf(draftSaveSchema, { step: 'nowhere', answers: { ends: ['front', 'front'], front: { extendedMm: 'abc' } } });
    expect(Object.keys(bad).sort()).toEqual(['answers.ends', 'answers.front.extendedMm', 'step']);
  });
});

test('a setup change must change something, and a dual-rate spring needs both figures', async () => {
  expect(Object.keys(await fieldsOf(setupChangeSchema, { note: 'x' }))).toEqual(['']);
  expect(Object.keys(await fieldsOf(setupChangeSchema, { rear: { spring: { rateNmm: 100, secondRateNmm: 120 } } }))).toEqual(['rear.spring.breakMm']);
  expect(await fieldsOf(setupChangeSchema, { front: { preloadPosition: '6,5' } })).toEqual({});
});

describe('shop data', () => {
  const road = { label: 'Road', note: '', front: { riderSagPct: [28, 33], staticSagPct: [15, 22] }, rear: { riderSagPct: [28, 33], staticSagPct: [5, 12] } };

  test('a profile needs ordered windows within 0-100 %, rider above static', async () => {
    expect(await fieldsOf(targetProfileUpdateSchema, road)).toEqual({});
    const fields = await fieldsOf(targetProfileUpdateSchema, {
      ...road,
      front: { riderSagPct: [33, 28], staticSagPct: [15, 22] },
      rear: { riderSagPct: [10, 33], staticSagPct: [5, 120] },
    });
    expect(Object.keys(fields).sort()).toEqual(['front.riderSagPct[1]', 'rear.riderSagPct[0]', 'rear.staticSagPct[1]']);
  });

  test('engine settings are checked per key and plausibility windows stay ordered', () => {
    const stored = engineSettingSeeds;
    expect(checkEngineSettings({ dampingRatio: '0,35', 'plausible.bikeKg.max': 500 }, stored)).toEqual({ ok: true, values: { dampingRatio: 0.35, 'plausible.bikeKg.max': 500 } });
    const refused = checkEngineSettings({ dampingRatio: 0, 'adjusterResolution.stepped': 1.5, 'plausible.bikeKg.min': 600, nonsense: 1, luggageRearShare: 'x' }, stored);
    expect(refused.ok).toBe(false);
    if (refused.ok) return;
    expect(Object.keys(refused.fields).sort()).toEqual(['adjusterResolution.stepped', 'dampingRatio', 'luggageRearShare', 'nonsense', 'plausible.bikeKg.min']);
    expect(checkEngineSettings({}, stored).ok).toBe(false);
    expect(checkEngineSettings(undefined, stored).ok).toBe(false);
  });
});
