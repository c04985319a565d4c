import { sizeBike } from '@shared/sizing';
import type { EndResult, FrontRequest, RearRequest, SizingRequest } from '@shared/types/sizing';
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
  ['stepped shock cam', roadRequest({ rear: roadRear({ preloadMm: 6, adjuster: { kind: 'stepped', mmPerUnit: 3, position: 2, maxPosition: 7 } }) }), 'rear', 2.5],
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
    const request = roadRequest();
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
    expect(collar.instruction).toMatch(/^(Add|Remove) [\d.]+ turns of preload \(to [\d.]+ turns\)\.$/);
    expect(collar.position).toBeCloseTo(4 + collar.roundedChangeUnits, 12);
  });
});
