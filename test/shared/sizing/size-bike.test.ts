import { ENGINE_VERSION, sizeBike } from '@shared/sizing';
import { makeShockModel } from '@shared/sizing/shock';
import { makeSpringLaw } from '@shared/sizing/spring-law';
import type { EndResult, LinkagePoint, SizingRequest, WarningCode } from '@shared/types/sizing';
import { collectNumbers, forkSpring, makeContext, roadFront, roadProfile, roadRear, roadRequest, shockSpring } from './fixtures';

const g = 9.80665; // standard gravity (CGPM 1901; NIST SP 811)
const cos25 = Math.cos((25 * Math.PI) / 180);
const context = makeContext();

const codes = (end: EndResult | undefined) => (end ? end.warnings.map((w) => w.code) : []);
const run = (request: SizingRequest, ctx = context) => sizeBike(request, ctx);

describe('sizeBike: shape of the result', () => {
  it('carries the engine version and the profile, and only the ends asked for', () => {
    const result = run(roadRequest({ rear: undefined }));
    expect(result.engineVersion).toBe(ENGINE_VERSION);
    expect(result.discipline).toBe('road');
    expect(result.profileLabel).toBe('Road');
    expect(result.front).toBeDefined();
    expect(result.rear).toBeUndefined();
    expect(result.front?.target).toMatchObject({ discipline: 'road', label: 'Road', source: 'profile' });
  });

  it('states the profile window in mm and % of travel, and its middles', () => {
    const front = run(roadRequest()).front!;
    // Road front: rider 28-33 %, static 15-22 % of 120 mm (sizing-defaults seed, common practice).
    expect(front.target.riderSagMm.min).toBeCloseTo(33.6, 12);
    expect(front.target.riderSagMm.max).toBeCloseTo(39.6, 12);
    expect(front.target.staticSagPct).toEqual({ min: 15, max: 22 });
    expect(front.target.riderMiddleMm).toBeCloseTo(36.6, 12);
    expect(front.target.staticMiddleMm).toBeCloseTo(22.2, 12);
  });

  it('centres the profile widths on an explicit target', () => {
    const front = run(roadRequest({ front: roadFront({ target: { riderSagMm: 40, staticSagMm: 25 } }) })).front!;
    expect(front.target.source).toBe('request');
    // Widths 5 % and 7 % of 120 mm = 6 and 8.4 mm, so +-3 and +-4.2 around the given middles.
    expect(front.target.riderSagMm.min).toBeCloseTo(37, 9);
    expect(front.target.riderSagMm.max).toBeCloseTo(43, 9);
    expect(front.target.staticSagMm.min).toBeCloseTo(20.8, 9);
    expect(front.target.staticSagMm.max).toBeCloseTo(29.2, 9);
    expect(front.target.riderMiddleMm).toBe(40);
  });

  it('has no NaN or Infinity anywhere', () => {
    const numbers = collectNumbers(run(roadRequest()));
    expect(numbers.filter(([, v]) => !Number.isFinite(v))).toEqual([]);
  });
});

describe('sizeBike: from weights', () => {
  const result = run(roadRequest({ rear: roadRear({ gasForceN: undefined }) }));
  const front = result.front!;

  it('predicts sags from the intake loads and says so', () => {
    expect(front.mode).toBe('weights');
    // W_SF = (220*0.5 - 20)*g = 90 g = 882.5985 N; sag = 882.5985*cos25/(2*9) - 8 = 44.43922 - 8 = 36.43922 mm.
    expect(front.staticSagMm).toBeCloseTo((90 * g * cos25) / 18 - 8, 9);
    expect(front.staticSagPct).toBeCloseTo(((front.staticSagMm as number) / 120) * 100, 12);
    expect(front.loads).toMatchObject({ source: 'intake', calibrated: null });
    expect(front.impliedRateNmm).toBeNull();
    expect(front.frictionBandMm).toBeNull();
    expect(codes(front)).toEqual(expect.arrayContaining(['weights-mode', 'fork-air-ignored']));
    expect(codes(result.rear)).toContain('gas-force-unknown');
  });

  it('gives the ideal rate W_R*cos/(n*(S* - T*))', () => {
    // W_RF = 88*0.35*g = 302.0448 N: 302.0448 * 0.9063078 / (2 * (36.6 - 22.2)) = 9.50505 N/mm.
    expect(front.idealRateNmm).toBeCloseTo((88 * 0.35 * g * cos25) / (2 * 14.4), 9);
  });

  it('flags a bottomed and a topped-out prediction instead of giving a number', () => {
    const soft = run(roadRequest({ front: roadFront({ rateNmm: 2, preloadMm: 0 }) })).front!;
    expect(soft.riderSagMm).toBeNull();
    expect(soft.riderSagPct).toBeNull();
    expect(codes(soft)).toContain('bottomed-out');
    const preloaded = run(
      roadRequest({ front: roadFront({ preloadMm: 60, adjuster: { kind: 'spacer', mmPerUnit: 1, position: 60, maxPosition: 80 } }) }),
    ).front!;
    expect(preloaded.staticSagMm).toBe(0);
    expect(codes(preloaded)).toContain('topped-out');
  });
});

describe('sizeBike: from readings', () => {
  // Front: L0 600, static pair 568/574 (mean 571, +-3), rider 560: S_S = 29, S_R = 40.
  const readings = { extendedMm: 600, staticMm: { pushedMm: 568, liftedMm: 574 }, riderMm: 560 };
  const front = run(roadRequest({ front: roadFront({ readings }) })).front!;

  it('averages the pair and reports the friction band', () => {
    expect(front.mode).toBe('readings');
    expect(front.staticSagMm).toBeCloseTo(29, 12);
    expect(front.riderSagMm).toBeCloseTo(40, 12);
    expect(front.frictionBandMm).toEqual({ static: 3, rider: null });
  });

  it('calibrates the loads on the installed spring and shows the intake figures beside them', () => {
    // W_S = n*k0*(S_S + p0)/cos = 18*37/0.9063078 = 734.8497 N; W_R = 18*11/0.9063078 = 218.4688 N.
    expect(front.loads.source).toBe('calibrated');
    expect(front.loads.staticN).toBeCloseTo((18 * 37) / cos25, 9);
    expect(front.loads.riderN).toBeCloseTo((18 * 11) / cos25, 9);
    expect(front.loads.intake.staticN).toBeCloseTo(90 * g, 9);
    expect(front.fromWeights.staticSagMm).toBeCloseTo((90 * g * cos25) / 18 - 8, 9);
    // Ideal with measurements: k0*(S_R - S_S)/(S* - T*) = 9 * 11 / 14.4 = 6.875 N/mm.
    expect(front.idealRateNmm).toBeCloseTo(6.875, 9);
  });

  it('gives the implied rate with its band, and warns on a mismatch', () => {
    // k_imp = W_R(intake)*cos/(n*(S_R - S_S)) = 88*0.35*g*0.9063078/(2*11) = 12.44297 N/mm.
    const implied = (88 * 0.35 * g * cos25) / 22;
    expect(front.impliedRateNmm).toBeCloseTo(implied, 9);
    // Band: k_imp * (3 + 0)/11 (the rate goes with 1/(S_R - S_S)).
    expect(front.impliedRateBandNmm).toBeCloseTo((implied * 3) / 11, 9);
    // 12.44 against 9 N/mm is 38 % apart, more than the 15 % threshold (common practice).
    const mismatch = front.warnings.find((w) => w.code === 'implied-rate-mismatch');
    expect(mismatch?.hint).toMatch(/Re-check/);
  });

  it('finds the installed rate again from readings that match the weights', () => {
    // Readings made from the model's own predicted sags: the implied rate is the stated one.
    const predicted = run(roadRequest()).rear!;
    const rear = roadRear({
      readings: { extendedMm: 500, staticMm: 500 - (predicted.staticSagMm as number), riderMm: 500 - (predicted.riderSagMm as number) },
    });
    const measured = run(roadRequest({ rear })).rear!;
    expect(measured.impliedRateNmm).toBeCloseTo(120, 9);
    expect(codes(measured)).not.toContain('implied-rate-mismatch');
    expect(measured.loads.staticN).toBeCloseTo(measured.loads.intake.staticN, 9);
  });

  it('warns about a wide friction band: over 10 mm on the fork, over 5 mm on the shock (common practice)', () => {
    const wideFront = run(roadRequest({ front: roadFront({ readings: { ...readings, staticMm: { pushedMm: 565, liftedMm: 577 } } }) })).front!;
    expect(codes(wideFront)).toContain('friction-band-large');
    expect(codes(front)).not.toContain('friction-band-large'); // 6 mm on the fork
    const rear = run(
      roadRequest({ rear: roadRear({ readings: { extendedMm: 600, staticMm: 590, riderMm: { pushedMm: 557, liftedMm: 563 } } }) }),
    ).rear!;
    expect(codes(rear)).toContain('friction-band-large'); // 6 mm on the shock
  });

  it('flags a swapped pair, and readings that show no rider sag', () => {
    const swapped = run(roadRequest({ front: roadFront({ readings: { ...readings, staticMm: { pushedMm: 574, liftedMm: 568 } } }) })).front!;
    expect(codes(swapped)).toContain('reading-order');
    const flat = run(roadRequest({ front: roadFront({ readings: { extendedMm: 600, staticMm: 571, riderMm: 571 } }) })).front!;
    expect(codes(flat)).toContain('reading-order');
    expect(flat.loads.source).toBe('intake');
    expect(flat.impliedRateNmm).toBeNull();
  });

  it('takes readings equal to within float noise as equal: no rider sag, no calibration', () => {
    // Rider pair 500.2/500.4 averages to 500.29999999999995, not 500.3: S_R - S_S = 6e-14 mm, which
    // would otherwise calibrate a rider load of almost nothing and imply a rate of about 1e14 N/mm.
    const front = run(
      roadRequest({ front: roadFront({ travelMm: 150, readings: { extendedMm: 600, staticMm: 500.3, riderMm: { pushedMm: 500.2, liftedMm: 500.4 } } }) }),
    ).front!;
    expect(codes(front)).toContain('reading-order');
    expect(front.loads.source).toBe('intake');
    expect(front.impliedRateNmm).toBeNull();
  });

  it('takes a rider reading at full travel as a bound only: warns and falls back to the weights', () => {
    // L0 600, L2 480 on a 120 mm fork: rider sag 120 mm, the whole travel.
    const bottomed = run(roadRequest({ front: roadFront({ readings: { extendedMm: 600, staticMm: 560, riderMm: 480 } }) })).front!;
    const warning = bottomed.warnings.find((w) => w.code === 'bottomed-out');
    expect(warning?.message).toMatch(/rider reading .* only a bound/);
    expect(warning?.hint).toMatch(/intake weights/);
    expect(bottomed.loads.source).toBe('intake');
    expect(bottomed.loads.calibrated).toBeNull();
    expect(bottomed.impliedRateNmm).toBeNull();
  });

  it('says the end is topped out when the static reading shows no sag, and calibrates the total from the rider reading', () => {
    const topped = run(roadRequest({ front: roadFront({ readings: { extendedMm: 600, staticMm: 600, riderMm: 585 } }) })).front!;
    expect(codes(topped)).toContain('topped-out');
    expect(topped.loads.source).toBe('rider-reading');
    expect(topped.impliedRateNmm).toBeNull();
    // The total: n*k0*(S_R + p0)/cos = 18*(15 + 8)/cos25; the static part is at most n*k0*p0/cos = 18*8/cos25.
    expect(topped.loads.staticN + topped.loads.riderN).toBeCloseTo((18 * 23) / cos25, 9);
    expect(topped.loads.staticMaxN).toBeCloseTo((18 * 8) / cos25, 9);
  });
});

describe('sizeBike: verdicts, candidates and the ride', () => {
  it('calls the preload out of range and holds the setting at the end stop', () => {
    const front = run(roadRequest({ front: roadFront({ adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 8 } }) })).front!;
    expect(front.verdict).toBe('preload-out-of-range');
    expect(front.preload?.limitedByRange).toBe(true);
    expect(front.preload?.position).toBe(8);
    expect(codes(front)).toContain('adjuster-range');
    expect(front.decision.kind).toBe('change');
    // Needs 23 mm of preload; 8 turns give 11 mm: a 12 mm spacer under the spring at 8 turns reaches it.
    expect(front.decision.text.headline).toBe(
      "Fit a preload spacer 12 mm long under the spring and set the adjuster to 8 turns: the 9 N/mm spring suits, but it needs 23 mm of preload, outside the adjuster's 3 mm to 11 mm.",
    );
  });

  it('never advises a preload below the captive minimum (2 mm, common practice)', () => {
    // Upright fork, two 20 N/mm springs, p0 = 5 mm at 5 turns: W_S = 90 g = 882.5985 N, W_R = 30.8 g = 302.0448 N.
    // Static sag 882.5985/40 - p = 22.065 - p; the 26.4 mm static maximum needs p = -4.335 mm.
    const front = run(
      roadRequest({ front: roadFront({ rakeDeg: 0, rateNmm: 20, preloadMm: 5, adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 15 } }) }),
    ).front!;
    expect(front.verdict).toBe('preload-out-of-range');
    expect(front.preload?.neededMm).toBeCloseTo(882.5985 / 40 - 26.4, 9);
    expect(front.preload?.limitedByRange).toBe(true);
    // The setting stops at 2 mm (2 turns), not at the adjuster's 0, where the spring would be loose.
    expect(front.preload?.position).toBe(2);
    expect((front.preload?.currentMm as number) + (front.preload?.roundedChangeMm as number)).toBeCloseTo(2, 12);
    expect(front.preload?.instruction).toBe('Remove 3 turns of preload (to 2 turns).');
    expect(front.preload?.staticSagAfterMm).toBeCloseTo(882.5985 / 40 - 2, 9);
  });

  it('notes when the adjuster, not a window, keeps rider sag off the middle', () => {
    // Rear 120 N/mm at LR 2.5, p0 = 8 mm, 1.5 mm/turn with 10/3 turns left: at most 13 mm of preload.
    // The middle, 38.125 mm, needs 1394.50563*2.5/120 - 38.125/2.5 = 13.802 mm; at 13 mm rider sag is
    // 2.5*(29.0522 - 13) = 40.13 mm and static 2.5*(17.3659 - 13) = 10.91 mm, both inside.
    const rear = run(
      roadRequest({ rear: roadRear({ adjuster: { kind: 'threaded', mmPerUnit: 1.5, position: 5, maxPosition: 5 + 10 / 3 } }) }),
    ).rear!;
    expect(rear.verdict).toBe('keep');
    expect(rear.target.aimRiderSagMm).toBeCloseTo(40.1305, 4);
    const note = rear.warnings.find((w) => w.code === 'adjuster-range');
    expect(note?.level).toBe('note');
    expect(note?.message).toMatch(/middle of its window \(38.1 mm\) needs 13.8 mm of preload, but the adjuster stops at 13 mm: .* 40.1 mm of rider sag instead/);
  });

  it('rates the ride now at the bike as set now, and after at the setting advised (linkage)', () => {
    // On a linkage the wheel rate depends on where the end rides (section 5g), so "now" is taken at the
    // present preload and rider sag, and "after" at the advised setting: here the two differ.
    const linkage: LinkagePoint[] = [
      [0, 0],
      [40, 14],
      [80, 31],
      [125, 50],
    ];
    const rearRequest = roadRear({ linkage, adjuster: { kind: 'threaded', mmPerUnit: 1.5, position: 5, maxPosition: 12 } });
    const rear = run(roadRequest({ front: undefined, rear: rearRequest })).rear!;
    expect(rear.decision.kind).toMatch(/keep|marginal/);
    const massKg = (rear.loads.staticN + rear.loads.riderN) / g;
    const hz = (wheelRateNmm: number) => Math.sqrt((wheelRateNmm * 1000) / massKg) / (2 * Math.PI);
    const model = makeShockModel(rearRequest);
    const nowRate = model.wheelRateAt(makeSpringLaw(120), 8, rear.riderSagMm as number);
    const afterRate = model.wheelRateAt(makeSpringLaw(120), 8 + rear.preload!.roundedChangeMm, rear.preload?.riderSagAfterMm as number);
    expect(rear.rideFrequencyHz.current).toBeCloseTo(hz(nowRate), 9);
    expect(rear.rideFrequencyHz.after).toBeCloseTo(hz(afterRate), 9);
    expect(Math.abs(hz(nowRate) - hz(afterRate))).toBeGreaterThan(0.01);
    // The same spring stays: no second preview curve and no damping hint.
    expect(rear.preview.new).toBeNull();
    expect(rear.decision.dampingHint).toBeNull();
  });

  it('calls a spring too soft or too stiff, names the ideal rate, and fits a catalogue spring that suits', () => {
    const soft = run(roadRequest({ rear: roadRear({ rateNmm: 70 }) })).rear!;
    expect(soft.verdict).toBe('too-soft');
    expect(soft.decision.kind).toBe('change');
    expect(soft.decision.text.reasons[0]).toMatch(/with the 70 N\/mm spring: .*about [\d.]+ N\/mm would\.$/);
    expect(soft.decision.pick?.sku).toBe(soft.recommendation.inStock?.sku);
    const stiff = run(roadRequest({ rear: roadRear({ rateNmm: 250 }) })).rear!;
    expect(stiff.verdict).toBe('too-stiff');
    expect(stiff.decision.text.headline).toMatch(/the 250 N\/mm spring is too stiff\.$/);
  });

  it('offers the best spring in stock and the best overall, with the ride figures for the one it fits', () => {
    // A 70 N/mm spring is too soft; the rear ideal is about 127 N/mm. Put the two nearest out of stock.
    const springs = {
      front: context.springs.front,
      rear: [shockSpring('S120', 120, 1, 1), shockSpring('S130', 130, 0), shockSpring('S140', 140, 3), shockSpring('S100', 100, 3)],
    };
    const rear = run(roadRequest({ rear: roadRear({ rateNmm: 70 }) }), makeContext({ springs })).rear!;
    const best = rear.recommendation.best!;
    const inStock = rear.recommendation.inStock!;
    expect(['S120', 'S130']).toContain(best.sku);
    expect(inStock.inStock).toBe(true);
    expect(['S140', 'S100']).toContain(inStock.sku);
    expect(rear.decision.pick?.sku).toBe(inStock.sku);
    // f = sqrt(k/LR^2 * 1000 / m)/(2 pi), m = (W_S + W_R)/g: now on the fitted 70, after on the in-stock pick.
    const m = (rear.loads.staticN + rear.loads.riderN) / g;
    expect(rear.rideFrequencyHz.after).toBeCloseTo(Math.sqrt(((inStock.rateNmm / 6.25) * 1000) / m) / (2 * Math.PI), 9);
    expect(rear.rideFrequencyHz.current).toBeCloseTo(Math.sqrt(((70 / 6.25) * 1000) / m) / (2 * Math.PI), 9);
    expect(rear.dampingRatioScale).toBeCloseTo(Math.sqrt(70 / inStock.rateNmm), 9);
    // Stiffer with the same damper: zeta falls by sqrt(k_old/k_new), so start with more rebound (section 5h).
    expect(rear.decision.dampingHint).toEqual({ direction: 'more', spring: { rateNmm: inStock.rateNmm, secondRateNmm: null }, conditional: false });
    expect(rear.decision.text.damping).toMatch(/^With the 1[04]0 N\/mm spring, start with more rebound damping/);
    expect(rear.preview.old?.zeta).toBe(0.3); // seeded default ride damping ratio (from memory)
    expect(rear.preview.new?.zeta).toBeCloseTo(0.3 * (rear.dampingRatioScale as number), 12);
    expect(rear.preview.new?.wnRadS).toBeCloseTo(2 * Math.PI * (rear.rideFrequencyHz.after as number), 12);
  });

  it('uses the damping ratio the request gives for the preview', () => {
    const rear = run(roadRequest({ dampingRatio: 0.5 })).rear!;
    expect(rear.preview.assumedDampingRatio).toBe(0.5);
    expect(rear.preview.old?.zeta).toBe(0.5);
    expect(rear.preview.old?.road.overshoot).toBeCloseTo(0.2984, 4); // road step at 0.5 (section 5i closed form)
  });

  it('warns about coil-bind and an empty choice', () => {
    const springs = { front: [{ ...forkSpring('F10', 10), maxDeflectionMm: 130 }], rear: [] };
    const result = run(roadRequest(), makeContext({ springs }));
    expect(codes(result.front)).toEqual(expect.arrayContaining(['coil-bind', 'no-candidate']));
    expect(codes(result.rear)).toContain('no-candidate');
    expect(result.rear?.recommendation).toEqual({ inStock: null, best: null, closestInStock: null, candidates: [] });
    expect(result.rear?.preview.new).toBeNull();
  });

  it('warns about implausible weights and a regressive linkage, and notes a dual-rate spring', () => {
    const falling: LinkagePoint[] = [
      [0, 0],
      [25, 16],
      [50, 22],
      [75, 28],
      [100, 38],
      [125, 50],
    ];
    const result = run(
      roadRequest({
        rider: { bodyKg: 190, gearKg: 8, rearShare: 0.65 },
        front: roadFront({ secondRateNmm: 12, breakMm: 60 }),
        rear: roadRear({ linkage: falling }),
      }),
    );
    expect(codes(result.front)).toEqual(expect.arrayContaining(['weights-implausible', 'single-rate-equivalent']));
    expect(codes(result.rear)).toEqual(expect.arrayContaining(['weights-implausible', 'regressive-linkage']));
  });

  it('gives null and a warning where a figure cannot be computed: no rider load on the front', () => {
    // Rider all on the rear: W_RF = 88*(1 - 1)*g = 0. A top box (share 1.3) lifting the front is a load case on top.
    const front = run(roadRequest({ rider: { bodyKg: 80, gearKg: 8, rearShare: 1 }, loadCases: [{ name: 'With luggage', massKg: 20, rearShare: 1.3 }] })).front!;
    expect(front.idealRateNmm).toBeNull();
    expect(codes(front)).toContain('weights-implausible');
    expect(collectNumbers(front).filter(([, v]) => !Number.isFinite(v))).toEqual([]);
  });

  it('refuses to aim at a profile whose windows cannot be met', () => {
    const broken = { ...roadProfile, rear: { riderSagPct: [5, 10] as [number, number], staticSagPct: [20, 30] as [number, number] } };
    const rear = run(roadRequest(), makeContext({ profile: broken })).rear!;
    const warningCodes: WarningCode[] = codes(rear);
    expect(warningCodes).toContain('target-invalid');
    expect(rear.verdict).toBeNull();
    expect(rear.idealRateNmm).toBeNull();
    expect(rear.verdictText).toMatch(/profile/);
  });
});
