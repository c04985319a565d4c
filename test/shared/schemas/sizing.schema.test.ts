import { sizingRequestSchema, validateSizingRequest } from '@shared/schemas/sizing.schema';
import type { SizingRequest } from '@shared/types/sizing';
import { roadFront, roadRear, roadRequest } from '../sizing/fixtures';

/** A request using every part the schema knows: readings (one paired), targets, a linkage, a dual rate. */
function fullRequest(): SizingRequest {
  return roadRequest({
    rider: { bodyKg: 80, gearKg: 8, rearShare: 0.65 },
    loadCases: [{ name: 'With luggage', massKg: 15, rearShare: 1.1 }],
    front: roadFront({
      secondRateNmm: 12,
      breakMm: 60,
      readings: { extendedMm: 600, staticMm: { pushedMm: 568, liftedMm: 574 }, riderMm: 560 },
      target: { riderSagMm: 36, staticSagMm: 22 },
    }),
    rear: roadRear({
      linkage: [
        [0, 0],
        [60, 22],
        [125, 50],
      ],
      readings: { extendedMm: 580, staticMm: 570, riderMm: { pushedMm: 538, liftedMm: 542 } },
    }),
    dampingRatio: 0.4,
  });
}

function fieldsFor(change: (r: Record<string, any>) => void): Record<string, string> {
  const body = structuredClone(fullRequest()) as unknown as Record<string, any>;
  change(body);
  const validation = validateSizingRequest(body);
  if (validation.ok) throw new Error('expected the request to be refused');
  return validation.fields;
}

describe('sizing request schema', () => {
  it('accepts a full, valid request and returns it parsed', () => {
    const validation = validateSizingRequest(fullRequest());
    expect(validation).toEqual({ ok: true, value: fullRequest() });
  });

  it('reads numbers typed with a decimal comma', () => {
    const body = structuredClone(fullRequest()) as unknown as Record<string, any>;
    body.front.rateNmm = '9,5';
    body.bike.massKg = ' 221,5 ';
    const validation = validateSizingRequest(body);
    expect(validation.ok && validation.value.front?.rateNmm).toBe(9.5);
    expect(validation.ok && validation.value.bike.massKg).toBe(221.5);
  });

  it('accepts one end alone, and leaves optional parts out', () => {
    const { front: _front, ...rearOnly } = roadRequest();
    expect(validateSizingRequest(rearOnly).ok).toBe(true);
  });

  const cases: [string, (r: Record<string, any>) => void, string, RegExp][] = [
    ['a missing field', (r) => delete r.bike.massKg, 'bike.massKg', /Bike wet mass is missing: weigh the bike/],
    ['text that is not a number', (r) => (r.rider.bodyKg = 'eighty'), 'rider.bodyKg', /must be a number/],
    ['a value out of physical range', (r) => (r.rider.bodyKg = 400), 'rider.bodyKg', /between 20 and 300 kg/],
    ['Infinity', (r) => (r.front.travelMm = Number.POSITIVE_INFINITY), 'front.travelMm', /between 30 and 350 mm/],
    ['a zero rate', (r) => (r.rear.rateNmm = 0), 'rear.rateNmm', /between 10 and 500 N\/mm/],
    ['a fork rate no spring has (0.001 N/mm)', (r) => (r.front.rateNmm = 0.001), 'front.rateNmm', /between 1 and 50 N\/mm/],
    ['a front share outside 0..1', (r) => (r.bike.frontShare = 1.2), 'bike.frontShare', /between 0 and 1/],
    ['a rider share outside 0..1', (r) => (r.rider.rearShare = -0.1), 'rider.rearShare', /between 0 and 1/],
    ['a luggage share beyond a top box', (r) => (r.loadCases[0].rearShare = 1.8), 'loadCases[0].rearShare', /top box/],
    ['a load case without a name', (r) => (r.loadCases[0].name = ' '), 'loadCases[0].name', /needs a name/],
    ['unsprung mass above the wheel weight', (r) => (r.bike.unsprungRearKg = 120), 'bike.unsprungRearKg', /re-check it and the front share/],
    ['three sprung legs', (r) => (r.front.springCount = 3), 'front.springCount', /1 or 2/],
    ['a rake beyond 45 degrees', (r) => (r.front.rakeDeg = 60), 'front.rakeDeg', /between 0 and 45 degrees/],
    ['an air-sprung fork', (r) => (r.front.springType = 'air'), 'front.springType', /air-sprung fork cannot be sized here: this model sizes coil springs only/],
    ['an air-sprung shock', (r) => (r.rear.springType = 'air'), 'rear.springType', /air-sprung shock/],
    ['an unknown spring type', (r) => (r.rear.springType = 'leaf'), 'rear.springType', /must be 'coil'/],
    ['a second rate without its break point', (r) => delete r.front.breakMm, 'front.breakMm', /needs its break point/],
    ['a break point without the second rate', (r) => delete r.front.secondRateNmm, 'front.secondRateNmm', /needs the second rate/],
    ['a static length above the extended one', (r) => (r.front.readings.staticMm = 610), 'front.readings.staticMm', /re-measure both between the same two marks/],
    ['a rider length above the static one', (r) => (r.front.readings.riderMm = 580), 'front.readings.riderMm', /re-measure with the rider aboard/],
    ['a pair averaging above the static one', (r) => (r.rear.readings.riderMm = { pushedMm: 568, liftedMm: 574 }), 'rear.readings.riderMm', /longer than the static length/],
    ['a rider sag beyond the travel', (r) => (r.front.readings.riderMm = 470), 'front.readings.riderMm', /more than the travel/],
    ['a half-given pair', (r) => delete r.front.readings.staticMm.liftedMm, 'front.readings.staticMm.liftedMm', /Static length after lifting is missing/],
    ['a missing extended length', (r) => delete r.rear.readings.extendedMm, 'rear.readings.extendedMm', /wheel off the ground/],
    ['a target static sag above the rider sag', (r) => (r.front.target.staticSagMm = 40), 'front.target.staticSagMm', /less than the target rider sag/],
    ['a target rider sag beyond the travel', (r) => (r.front.target.riderSagMm = 130), 'front.target.riderSagMm', /more than the travel/],
    ['a linkage not starting at [0, 0]', (r) => (r.rear.linkage[0] = [2, 0]), 'rear.linkage[0]', /start at \[0, 0\]/],
    ['a linkage point going back', (r) => (r.rear.linkage[1] = [60, 0]), 'rear.linkage[1]', /both wheel and shock travel must increase; re-measure it/],
    ['a linkage not ending at full travel', (r) => (r.rear.linkage[2] = [120, 50]), 'rear.linkage[2]', /end at the full travel, \[125, 50\]/],
    ['a malformed linkage point', (r) => (r.rear.linkage[1] = [60]), 'rear.linkage[1]', /must be two numbers/],
    ['a one-point linkage', (r) => (r.rear.linkage = [[0, 0]]), 'rear.linkage', /2 to 60 points/],
    ['a linkage that is not a list', (r) => (r.rear.linkage = 'steep'), 'rear.linkage', /list of \[wheel mm, shock mm\]/],
    ['a leverage ratio out of range', (r) => (delete r.rear.linkage, (r.rear.shockStrokeMm = 200), (r.rear.wheelTravelMm = 60)), 'rear.shockStrokeMm', /leverage ratio of 0.30/],
    ['an unknown adjuster', (r) => (r.front.adjuster.kind = 'knob'), 'front.adjuster.kind', /threaded, stepped or spacer/],
    ['an adjuster setting beyond its range', (r) => (r.rear.adjuster.position = 20), 'rear.adjuster.position', /re-count it from the adjuster's zero/],
    ['an adjuster maximum below its minimum', (r) => ((r.rear.adjuster.minPosition = 5), (r.rear.adjuster.maxPosition = 4), (r.rear.adjuster.position = 4)), 'rear.adjuster.maxPosition', /above its minimum/],
    ['a missing adjuster', (r) => delete r.front.adjuster, 'front.adjuster', /preload adjuster is missing/],
    ['a missing spring family', (r) => (r.front.family = '  '), 'front.family', /Spring family is missing/],
    ['an unknown discipline format', (r) => (r.discipline = 'Road Race!'), 'discipline', /lower case, like 'road' or 'touring'/],
    ['a damping ratio of 0', (r) => (r.dampingRatio = 0), 'dampingRatio', /about 0.2 to 0.5/],
    ['no end at all', (r) => (delete r.front, delete r.rear), 'ends', /front, the rear or both/],
    ['a missing rider', (r) => delete r.rider, 'rider', /rider is missing/],
  ];

  it.each(cases)('refuses %s with a message at its path', (_name, change, path, message) => {
    const fields = fieldsFor(change);
    expect(fields[path]).toMatch(message);
  });

  it('gives each kind of bad field its own message', () => {
    const messages = cases.map(([, change, path]) => fieldsFor(change)[path]);
    const kinds = new Set(messages);
    // Messages repeat only where two cases are the same kind of fault (range, air, pair order).
    expect(kinds.size).toBeGreaterThanOrEqual(cases.length - 4);
  });

  it('reports every bad field at once, one message per path', () => {
    const fields = fieldsFor((r) => {
      r.rider.bodyKg = 'x';
      r.front.springType = 'air';
      r.rear.readings.staticMm = 590;
      r.rear.linkage[0] = [1, 1];
    });
    expect(Object.keys(fields).sort()).toEqual(['front.springType', 'rear.linkage[0]', 'rear.readings.staticMm', 'rider.bodyKg']);
  });

  it('compares readings allowing for the float noise of a mean', () => {
    // 500.2 and 500.4 average to 500.29999999999995 in binary floating point: a rider reading of 500.3
    // is the same length, not a longer one.
    const body = structuredClone(fullRequest()) as unknown as Record<string, any>;
    body.front.travelMm = 150;
    body.front.readings = { extendedMm: 600, staticMm: { pushedMm: 500.2, liftedMm: 500.4 }, riderMm: 500.3 };
    expect(validateSizingRequest(body)).toMatchObject({ ok: true });
  });

  it('holds each of a pushed and lifted pair to the extended length', () => {
    // Lifted 610 with L0 600: the pair's mean (590) is shorter, but a loaded reading cannot be longer than L0.
    const fields = fieldsFor((r) => (r.front.readings.staticMm = { pushedMm: 570, liftedMm: 610 }));
    expect(fields['front.readings.staticMm.liftedMm']).toMatch(/longer than the extended length/);
    expect(Object.keys(fields)).toEqual(['front.readings.staticMm.liftedMm']);
  });

  it('judges the order of readings and masses only on values that passed their own checks', () => {
    // A negative static length is refused for itself, not also as shorter than the rider length.
    expect(fieldsFor((r) => (r.front.readings.staticMm = -5))).toEqual({ 'front.readings.staticMm': expect.stringMatching(/above 0/) });
    // A front share of 1.2 is refused for itself, not also for leaving no weight on the rear wheel.
    expect(fieldsFor((r) => (r.bike.frontShare = 1.2))).toEqual({ 'bike.frontShare': expect.stringMatching(/between 0 and 1/) });
    // A travel out of range is not used to judge the sags or the target.
    expect(Object.keys(fieldsFor((r) => (r.front.travelMm = 20)))).toEqual(['front.travelMm']);
  });

  it('says in plain words that an end or a linkage given as null must be given or left out', () => {
    expect(fieldsFor((r) => (r.front = null)).front).toMatch(/^The front end must give .* or be left out\.$/);
    expect(fieldsFor((r) => (r.rear.linkage = null))['rear.linkage']).toMatch(/list of \[wheel mm, shock mm\] points, or left out/);
    expect(fieldsFor((r) => (r.front.readings = null))['front.readings']).toMatch(/or left out/);
  });

  it('reads linkage numbers typed with a decimal comma', () => {
    const body = structuredClone(fullRequest()) as unknown as Record<string, any>;
    body.rear.linkage = [['0', '0'], ['60,5', ' 22,25 '], [125, '50']];
    const validation = validateSizingRequest(body);
    expect(validation.ok && validation.value.rear?.linkage).toEqual([
      [0, 0],
      [60.5, 22.25],
      [125, 50],
    ]);
  });

  it('lets the last linkage point sit within 1 % of the full travel and stroke', () => {
    // Travel 125 mm, stroke 50 mm: 1 % is 1.25 mm and 0.5 mm.
    const body = structuredClone(fullRequest()) as unknown as Record<string, any>;
    body.rear.linkage[2] = [124, 49.6];
    expect(validateSizingRequest(body).ok).toBe(true);
    expect(fieldsFor((r) => (r.rear.linkage[2] = [123.5, 50]))['rear.linkage[2]']).toMatch(/within 1 %/);
    expect(fieldsFor((r) => (r.rear.linkage[2] = [125, 50.6]))['rear.linkage[2]']).toMatch(/within 1 %/);
  });

  it('refuses a body that is not an object', () => {
    expect(validateSizingRequest(null)).toEqual({ ok: false, fields: { '': expect.stringMatching(/missing/) } });
    expect(validateSizingRequest('road')).toEqual({ ok: false, fields: { '': expect.stringMatching(/must be an object/) } });
  });

  it('is one Yup schema the forms can use directly', async () => {
    await expect(sizingRequestSchema.isValid(fullRequest())).resolves.toBe(true);
  });
});
