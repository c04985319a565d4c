import { sizeBike } from '@shared/sizing';
import { describeAdjustment } from '@shared/sizing/adjuster';
import { makeForkModel } from '@shared/sizing/fork';
import { findSettableBounds, gridNeighbours, type SettableGrid } from '@shared/sizing/settable-setting';
import { assessSpring } from '@shared/sizing/spring-assessment';
import { makeSpringLaw } from '@shared/sizing/spring-law';
import type { SagWindows } from '@shared/sizing/targets';
import type { Adjuster, EndResult, FrontRequest, RearRequest, SizingRequest } from '@shared/types/sizing';
import { makeContext, roadFront, roadRear, roadRequest } from './fixtures';

const context = makeContext();

/** The same request with a new preload on one end (the adjuster moved with it, so its range holds). */
function withPreload(request: SizingRequest, end: 'front' | 'rear', preloadMm: number): SizingRequest {
  const current = request[end] as FrontRequest | RearRequest;
  const units = (preloadMm - current.preloadMm) / current.adjuster.mmPerUnit;
  const adjuster = { ...current.adjuster, position: current.adjuster.position + units, maxPosition: current.adjuster.maxPosition + Math.abs(units), minPosition: -100 };
  return { ...request, [end]: { ...current, preloadMm, adjuster } };
}

function endOf(request: SizingRequest, end: 'front' | 'rear'): EndResult {
  return sizeBike(request, context)[end] as EndResult;
}

/** Sag change per mm of preload: 1 on the fork's axis, LR at the wheel for a constant-ratio shock. */
const cases: [string, SizingRequest, 'front' | 'rear', number][] = [
  ['threaded fork cap', roadRequest({ front: roadFront({ adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 25 } }) }), 'front', 1],
  ['stepped fork', roadRequest({ front: roadFront({ preloadMm: 4, adjuster: { kind: 'stepped', mmPerUnit: 2.5, position: 2, maxPosition: 12 } }) }), 'front', 1],
  ['fork spacer', roadRequest({ front: roadFront({ preloadMm: 12, adjuster: { kind: 'spacer', mmPerUnit: 1, position: 15, maxPosition: 40 } }) }), 'front', 1],
  ['threaded shock collar', roadRequest({ rear: roadRear({ preloadMm: 6, adjuster: { kind: 'threaded', mmPerUnit: 1.5, position: 4, maxPosition: 14 } }) }), 'rear', 2.5],
  ['stepped shock cam', roadRequest({ rear: roadRear({ preloadMm: 6, adjuster: { kind: 'stepped', mmPerUnit: 2, position: 3, maxPosition: 9 } }) }), 'rear', 2.5],
];

describe('preload change in adjuster units (section 5f)', () => {
  it.each(cases)('%s: the unrounded change lands rider sag on the aim exactly', (_name, request, end) => {
    const result = endOf(request, end);
    expect(result.verdict).toBe('keep');
    const preload = result.preload!;
    const after = endOf(withPreload(request, end, preload.currentMm + preload.changeMm), end);
    expect(Math.abs((after.riderSagMm as number) - result.target.aimRiderSagMm)).toBeLessThan(1e-9);
  });

  it.each(cases)('%s: the rounded change lands within one step, and the sag reported for it is the model\'s', (_name, request, end, sagPerPreloadMm) => {
    const result = endOf(request, end);
    const preload = result.preload!;
    const kind = (request[end] as FrontRequest | RearRequest).adjuster.kind;
    const resolution = context.thresholds.adjusterResolution[kind];
    // Rounded to quarter turns, whole steps or 0.5 mm of spacer.
    expect(Math.abs(preload.roundedChangeUnits / resolution - Math.round(preload.roundedChangeUnits / resolution))).toBeLessThan(1e-9);
    const stepMm = resolution * (request[end] as FrontRequest | RearRequest).adjuster.mmPerUnit;
    expect(Math.abs((preload.riderSagAfterMm as number) - result.target.aimRiderSagMm)).toBeLessThanOrEqual(stepMm * sagPerPreloadMm + 1e-9);
    const rounded = endOf(withPreload(request, end, preload.currentMm + preload.roundedChangeMm), end);
    expect(rounded.riderSagMm).toBeCloseTo(preload.riderSagAfterMm as number, 9);
    expect(rounded.staticSagMm).toBeCloseTo(preload.staticSagAfterMm as number, 9);
  });

  it('front dp = S_R - S* and rear dp = (S_R - S*)/LR, static then S_S - (S_R - S*)', () => {
    const request = roadRequest({ front: roadFront({ adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 25 } }) });
    const front = endOf(request, 'front');
    const rear = endOf(request, 'rear');
    for (const [result, lr] of [
      [front, 1],
      [rear, 2.5],
    ] as const) {
      const shift = (result.riderSagMm as number) - result.target.aimRiderSagMm;
      expect(result.preload?.changeMm).toBeCloseTo(shift / lr, 9);
    }
    // Unrounded static sag, from the spec's S_S' = S_S - (S_R - S*): re-run at the unrounded preload.
    const after = endOf(withPreload(request, 'rear', rear.preload!.currentMm + rear.preload!.changeMm), 'rear');
    expect(after.staticSagMm).toBeCloseTo((rear.staticSagMm as number) - ((rear.riderSagMm as number) - rear.target.aimRiderSagMm), 9);
  });

  it('from readings, the change follows the measured sags: dp = (S_R - S*)/LR', () => {
    const rear = roadRear({ readings: { extendedMm: 600, staticMm: 590, riderMm: { pushedMm: 553, liftedMm: 557 } } });
    const result = endOf(roadRequest({ rear }), 'rear');
    expect(result.mode).toBe('readings');
    expect(result.riderSagMm).toBeCloseTo(45, 12); // 600 - (553 + 557)/2
    expect(result.preload?.changeMm).toBeCloseTo((45 - result.target.aimRiderSagMm) / 2.5, 9);
  });

  it.each([
    ['a linkage curve', roadRequest({ rear: roadRear({ linkage: [[0, 0], [40, 14], [80, 31], [125, 50]] }) }), 'rear'],
    ['a dual-rate fork spring', roadRequest({ front: roadFront({ rateNmm: 7, secondRateNmm: 12, breakMm: 45, adjuster: { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 30 } }) }), 'front'],
  ] as const)('with %s the unrounded change still lands on the aim', (_name, request, end) => {
    const result = endOf(request, end);
    expect(result.preload).not.toBeNull();
    const after = endOf(withPreload(request, end, result.preload!.currentMm + result.preload!.changeMm), end);
    expect(Math.abs((after.riderSagMm as number) - result.target.aimRiderSagMm)).toBeLessThan(1e-9);
  });

  it('says add or remove, and writes the instruction in the adjuster\'s own words', () => {
    const spacer = endOf(cases[2][1], 'front').preload!;
    expect(spacer.unit).toBe('mm');
    expect(spacer.instruction).toMatch(/^Fit a spacer [\d.]+ mm (longer|shorter)/);
    const collar = endOf(cases[3][1], 'rear').preload!;
    expect(collar.unit).toBe('turns');
    expect(collar.direction).toBe(collar.roundedChangeUnits > 0 ? 'add' : 'remove');
    expect(collar.instruction).toMatch(/^(Add|Remove) [\d/ ]+ turns? of preload \(to [\d/ ]+ turns?\)\.$/);
    expect(collar.position).toBeCloseTo(4 + collar.roundedChangeUnits, 12);
  });
});

describe('rounding onto what a person can set (section 5f)', () => {
  const collar: Adjuster = { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 15 };
  const gridOf = (rangeMm: { min: number; max: number }, adjuster = collar): SettableGrid => ({ adjuster, currentPreloadMm: 5, resolution: 0.25, rangeMm });

  it('tries the quarter turns either side of the preload aimed at', () => {
    // +-0.125 mm on a 1 mm/turn collar is half a quarter turn either way: both neighbours are tried.
    const grid = gridOf({ min: 0, max: 15 });
    const bounds = findSettableBounds(grid)!;
    expect(gridNeighbours(grid, bounds, 5.125)).toEqual([5, 5.25]);
    expect(gridNeighbours(grid, bounds, 4.875)).toEqual([4.75, 5]);
    expect(gridNeighbours(grid, bounds, 6)).toEqual([6]);
  });

  it('never sets less than the captive minimum: from the first step above it when it falls between steps', () => {
    // p0 = 5 mm at 5 turns, captive minimum 2.1 mm: 2.1 mm sits at 2.1 turns, so the first quarter
    // turn above it, 2.25 turns (2.25 mm), is the least that may be set.
    const grid = gridOf({ min: 2.1, max: 15 });
    expect(findSettableBounds(grid)).toEqual([2.25, 15]);
    expect(gridNeighbours(grid, findSettableBounds(grid)!, -4)).toEqual([2.25]);
    // The adjuster's own stop can be set exactly, on the grid or not.
    const offGrid = gridOf({ min: -0.1, max: 14.9 }, { ...collar, position: 5.1 });
    expect(findSettableBounds(offGrid)).toEqual([0, 15]);
    // Coil-bind below the stop: the last step short of it, 12.75 turns for 12.8 mm.
    expect(findSettableBounds(gridOf({ min: 2, max: 12.8 }))).toEqual([2, 12.75]);
    // A captive minimum above the coil-bind limit leaves nothing to set.
    expect(findSettableBounds(gridOf({ min: 9, max: 8.9 }))).toBeNull();
  });

  it('writes one unit in the singular and turns in quarters', () => {
    expect(describeAdjustment('steps', { roundedChangeUnits: 1, position: 3, direction: 'add' })).toBe('add 1 step of preload (to 3 steps)');
    expect(describeAdjustment('turns', { roundedChangeUnits: -1, position: 1, direction: 'remove' })).toBe('remove 1 turn of preload (to 1 turn)');
    expect(describeAdjustment('turns', { roundedChangeUnits: 0.25, position: 5.25, direction: 'add' })).toBe('add 1/4 turn of preload (to 5 1/4 turns)');
    expect(describeAdjustment('turns', { roundedChangeUnits: 0.3, position: 5.3, direction: 'add' })).toBe('add 0.3 turn of preload (to 5.3 turns)');
    expect(describeAdjustment('mm', { roundedChangeUnits: 1, position: 11, direction: 'add' })).toBe('fit a spacer 1 mm longer (11 mm)');
  });

  describe('a setting that keeps both sags inside their windows', () => {
    // Upright fork, two 10 N/mm springs, W_S = 720 N, W_S + W_R = 1080 N: rider sag 54 - p, static 36 - p.
    const fork = makeForkModel(roadFront({ springCount: 2, rakeDeg: 0, travelMm: 120 }));
    const front = roadFront({ rateNmm: 10, preloadMm: 10, adjuster: { kind: 'stepped', mmPerUnit: 4, position: 0, maxPosition: 10 } });
    const windowsOf = (rider: [number, number], stat: [number, number]): SagWindows => ({
      source: 'request',
      riderSagMm: { min: rider[0], max: rider[1] },
      staticSagMm: { min: stat[0], max: stat[1] },
      riderMiddleMm: (rider[0] + rider[1]) / 2,
      staticMiddleMm: (stat[0] + stat[1]) / 2,
    });
    const grid: SettableGrid = { adjuster: front.adjuster, currentPreloadMm: 10, resolution: 1, rangeMm: { min: 2, max: 50 } };
    // 17.4 mm aimed at from 10 mm is 7.4 mm, 1.85 steps of 4 mm: the nearest step is 2.
    const settingFor = (windows: SagWindows) => assessSpring(fork, makeSpringLaw(10), { staticN: 720, riderN: 360 }, windows, grid).setting!;

    it('takes the other step when the nearest leaves a window and the other does not', () => {
      // 2 steps: p = 18 mm, rider sag 36 mm < 36.5. 1 step: p = 14 mm, rider 40 mm, static 22 mm, both inside.
      const setting = settingFor(windowsOf([36.5, 40.5], [17, 23]));
      expect(setting.position).toBe(1);
      expect(setting.fit).toBe('both');
      expect(setting.riderSagMm).toBeCloseTo(40, 12);
      expect(setting.staticSagMm).toBeCloseTo(22, 12);
    });

    it('keeps the step nearest the rider window when neither keeps both inside, and says so in its fit', () => {
      // 2 steps: rider 36 mm, 0.2 short of 36.2; 1 step: rider 40 mm, 3 past 37. Static is inside at both.
      const setting = settingFor(windowsOf([36.2, 37], [17, 23]));
      expect(setting.position).toBe(2);
      expect(setting.fit).toBe('static');
    });
  });

  it('offers a preload spacer when no step of a cam keeps both sags in (readings 640 / 628 / 596)', () => {
    // LR = 130/52 = 2.5, S_S = 12 mm, S_R = 44 mm; road rear windows on 130 mm: rider 36.4-42.9, static 6.5-15.6.
    // S_R - S_S = 32 mm, inside [36.4 - 15.6, 42.9 - 6.5] = [20.8, 36.4]: the rate suits. One step of 3 mm moves
    // both sags 7.5 mm: 2 steps leave rider sag 44 (out), 3 steps static sag 4.5 (out). A 1.5 mm spacer at 2 steps
    // moves both by 2.5*1.5 = 3.75 mm: rider 40.25, static 8.25, both in (2 mm would give 39 and 7, further off).
    const request = roadRequest({
      bike: { massKg: 200, frontShare: 0.5, unsprungFrontKg: 15, unsprungRearKg: 25 },
      rider: { bodyKg: 85, gearKg: 10, rearShare: 0.6 },
      front: undefined,
      rear: roadRear({
        wheelTravelMm: 130,
        shockStrokeMm: 52,
        gasForceN: 200,
        rateNmm: 95,
        preloadMm: 6,
        adjuster: { kind: 'stepped', mmPerUnit: 3, position: 2, maxPosition: 6 },
        readings: { extendedMm: 640, staticMm: 628, riderMm: 596 },
      }),
    });
    const rear = endOf(request, 'rear');
    expect(rear.verdict).toBe('preload-out-of-range');
    expect(rear.preload?.changeUnits).toBeCloseTo(0.58, 12);
    const warning = rear.warnings.find((w) => w.code === 'rounding-outside-window');
    expect(warning?.message).toMatch(/2 steps, gives 44 mm of rider sag \(window 36.4 to 42.9 mm\) and 12 mm of static sag \(window 6.5 to 15.6 mm\)/);
    const { decision } = rear;
    expect(decision.kind).toBe('change');
    const spacer = decision.steps.find((s) => s.kind === 'spacer');
    expect(spacer).toMatchObject({ lengthMm: 1.5, setting: { position: 2, changeUnits: 0 } });
    if (spacer?.kind !== 'spacer') return;
    expect(spacer.setting.riderSagMm).toBeCloseTo(40.25, 9);
    expect(spacer.setting.staticSagMm).toBeCloseTo(8.25, 9);
    expect(decision.text.headline).toBe(
      'Fit a preload spacer 1.5 mm long under the spring and set the adjuster to 2 steps: the 95 N/mm spring suits, but no step of the adjuster puts both sags in their windows.',
    );
  });
});
