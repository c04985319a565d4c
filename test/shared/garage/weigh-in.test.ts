/** Weigh-in totals and the sizing request built from a bike. Check values worked by hand (arithmetic, no source). */
import { buildSizingRequest, endsOf } from '@shared/garage/build-sizing-request';
import { completeReadings } from '@shared/garage/draft-readings';
import { displayUnitOf, toDisplayUnits } from '@shared/garage/units';
import { totalWeighIn } from '@shared/garage/weigh-in';
import { validateSizingRequest } from '@shared/schemas/sizing.schema';
import { BIKE_FIELDS } from '@shared/schemas/bike.fields';
import { GEAR_ITEMS_INFO, LOAD_KINDS_INFO, RIDING_POSITIONS_INFO } from '@shared/schemas/weigh-in.fields';
import { GEAR_ITEMS, LOAD_KINDS, RIDING_POSITIONS, type WeighIn } from '@shared/types/garage';
import { DEMO_BIKE_MODELS } from '../../../server/seed/demo-bike-models';

const weighIn: WeighIn = {
  bodyKg: 82,
  gear: { helmet: 1.5, jacket: 2.5, boots: 2.5, gloves: 0.3 },
  loads: [
    { kind: 'passenger', massKg: 70, rearShare: 0.95 },
    { kind: 'top-box', massKg: 10, rearShare: 1.2 },
  ],
  discipline: 'touring',
  position: 'upright',
  rearShare: 0.7,
};

test('gear adds up to the solo rider; the loads make load cases, each rear share weighted by mass', () => {
  const totals = totalWeighIn(weighIn);
  // 1.5 + 2.5 + 2.5 + 0.3 = 6.8 kg; 70 + 10 = 80 kg carried.
  expect(totals.gearKg).toBe(6.8);
  expect(totals.luggageKg).toBe(80);
  expect(totals.rider).toEqual({ bodyKg: 82, gearKg: 6.8, rearShare: 0.7 });
  // Passenger alone, the top box alone, and both: (70 x 0.95 + 10 x 1.2) / 80 = 78.5 / 80 = 0.98125.
  expect(totals.loadCases).toEqual([
    { name: 'With passenger', massKg: 70, rearShare: 0.95 },
    { name: 'With luggage', massKg: 10, rearShare: 1.2 },
    { name: 'With passenger and luggage', massKg: 80, rearShare: 0.98125 },
  ]);
});

test('without loads there are no load cases, and none is sent', () => {
  const totals = totalWeighIn({ ...weighIn, loads: [] });
  expect(totals.loadCases).toEqual([]);
  expect(buildSizingRequest({ bike: DEMO_BIKE_MODELS[0], weighIn: { ...weighIn, loads: [] }, ends: ['rear'] })).not.toHaveProperty('loadCases');
});

test('every demo model and a weigh-in make a request the sizing schema accepts, one to one', () => {
  for (const model of DEMO_BIKE_MODELS) {
    const request = buildSizingRequest({ bike: model, weighIn, ends: endsOf(model) });
    expect(validateSizingRequest(request)).toEqual({ ok: true, value: expect.anything() });
    expect(request.bike).toEqual(model.masses);
    expect(request.front).toEqual(expect.objectContaining({ travelMm: model.front?.travelMm, rateNmm: model.front?.rateNmm, family: model.front?.family }));
    expect(request.front?.adjuster).not.toHaveProperty('zeroReference');
    expect(request.rear).not.toHaveProperty('dampers');
  }
});

test('an end left out of `ends` is left out of the request', () => {
  const request = buildSizingRequest({ bike: DEMO_BIKE_MODELS[0], weighIn, ends: ['rear'] });
  expect(request.front).toBeUndefined();
  expect(request.rear).toBeDefined();
});

test('draft readings become engine readings only once complete', () => {
  expect(completeReadings({ extendedMm: 180, staticMm: { pushedMm: 158 }, riderMm: 140 })).toBeNull();
  expect(completeReadings({ staticMm: 160, riderMm: 140 })).toBeNull();
  expect(completeReadings({ extendedMm: 180, staticMm: { pushedMm: 158, liftedMm: 162 }, riderMm: 140 })).toEqual({
    extendedMm: 180,
    staticMm: { pushedMm: 158, liftedMm: 162 },
    riderMm: 140,
  });
});

test('every bike field has a unit, a help line, and a range when it is a number', () => {
  for (const [path, info] of Object.entries(BIKE_FIELDS)) {
    expect([path, info.help.length > 20]).toEqual([path, true]);
    const numeric = ['length', 'mass', 'rate', 'force', 'adjuster', 'clicks', 'share', 'angle', 'count'].includes(info.quantity);
    expect([path, numeric === !!info.range]).toEqual([path, true]);
  }
});

test('the typical values cover every gear item, position and kind of load', () => {
  expect(Object.keys(GEAR_ITEMS_INFO).sort()).toEqual([...GEAR_ITEMS].sort());
  expect(Object.keys(RIDING_POSITIONS_INFO).sort()).toEqual([...RIDING_POSITIONS].sort());
  expect(Object.keys(LOAD_KINDS_INFO).sort()).toEqual([...LOAD_KINDS].sort());
  // sizing.md section 2: r 0.55-0.75 by riding position (from memory); passenger 0.9-1.0, top box 1.1-1.3.
  for (const p of Object.values(RIDING_POSITIONS_INFO)) expect(p.rearShare >= 0.55 && p.rearShare <= 0.75).toBe(true);
  expect(LOAD_KINDS_INFO.passenger.rearShare).toBeGreaterThanOrEqual(0.9);
  expect(LOAD_KINDS_INFO['top-box'].rearShare).toBeGreaterThan(1.1 - 1e-9);
});

test('imperial shows inches, pounds and the chosen rate unit', () => {
  const units = toDisplayUnits({ system: 'imperial', rateUnit: 'kgf/mm' });
  expect([displayUnitOf('length', units), displayUnitOf('mass', units), displayUnitOf('rate', units), displayUnitOf('force', units)]).toEqual(['in', 'lb', 'kgf/mm', 'lbf']);
  expect(displayUnitOf('adjuster', units, 'steps')).toBe('steps');
});
