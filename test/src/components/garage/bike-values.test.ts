import { formToSpec, newDamperRow, specToForm } from '@/components/garage/bike-values';
import { toDisplayUnits } from '@shared/garage/units';
import { bikeFormSchema } from '@shared/schemas/bike.schema';
import type { BikeSpec } from '@shared/types/bike';

/** A road bike's values, as a shop model would hold them. */
const SPEC: BikeSpec = {
  masses: { massKg: 190, frontShare: 0.5, unsprungFrontKg: 18, unsprungRearKg: 22 },
  front: {
    travelMm: 130,
    springCount: 2,
    rakeDeg: 25,
    rateNmm: 9,
    secondRateNmm: null,
    breakMm: null,
    preloadMm: 10,
    family: 'fork',
    adjuster: { kind: 'spacer', mmPerUnit: 1, position: 0, minPosition: -10, maxPosition: 20, zeroReference: 'stock spacer', addsPreload: 'longer spacer' },
    dampers: [],
  },
  rear: {
    wheelTravelMm: 135,
    shockStrokeMm: 50,
    gasForceN: null,
    linkage: null,
    rateNmm: 95,
    secondRateNmm: null,
    breakMm: null,
    preloadMm: 10,
    family: 'shock',
    adjuster: { kind: 'stepped', mmPerUnit: 2.5, position: 2, minPosition: 0, maxPosition: 6, zeroReference: 'softest step', addsPreload: 'clockwise' },
    // Invented: a rebound clicker with a maker's standard and a dyno figure, compression in quarter turns.
    dampers: [
      { kind: 'rebound', unit: 'clicks', maxPosition: 20, standard: 10, position: 12, dampingPerStepNsPerM: 35.5 },
      { kind: 'hs-compression', unit: 'turns', maxPosition: 2.5, standard: null, position: 1.25, dampingPerStepNsPerM: null },
    ],
  },
};

const imperial = toDisplayUnits({ system: 'imperial', rateUnit: 'kgf/mm' });
const metric = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });

describe('a bike’s values on the garage form', () => {
  it.each([
    ['metric', metric],
    ['imperial', imperial],
  ])('survive the round trip through the form in %s units', (_, units) => {
    const spec = SPEC;
    const values = specToForm(spec, 'Blue one', units);
    const back = bikeFormSchema.validateSync(formToSpec(values, units, spec));
    expect(back.masses.massKg).toBeCloseTo(spec.masses.massKg, 1);
    expect(back.rear!.rateNmm).toBeCloseTo(spec.rear!.rateNmm, 1);
    expect(back.rear!.adjuster.position).toBe(spec.rear!.adjuster.position);
    expect(back.front!.travelMm).toBeCloseTo(spec.front!.travelMm, 1);
    expect(back.rear!.dampers).toEqual(spec.rear!.dampers);
    expect(back.front!.dampers).toEqual([]);
  });

  it('holds each damping adjuster as a row of typed text; empty is none, a decimal comma is read', () => {
    const values = specToForm(SPEC, 'Blue one', metric) as Record<string, Record<string, unknown>>;
    expect(values.rear.dampers).toEqual([
      { kind: 'rebound', unit: 'clicks', maxPosition: '20', standard: '10', position: '12', dampingPerStepNsPerM: '35.5' },
      { kind: 'hs-compression', unit: 'turns', maxPosition: '2.5', standard: '', position: '1.25', dampingPerStepNsPerM: '' },
    ]);
    const typed = { ...values, rear: { ...values.rear, dampers: [{ ...newDamperRow('ls-compression'), maxPosition: '3', position: '1,75' }] } } as never;
    expect((formToSpec(typed, metric, SPEC).rear as { dampers: unknown[] }).dampers).toEqual([
      { kind: 'ls-compression', unit: 'clicks', maxPosition: 3, standard: null, position: 1.75, dampingPerStepNsPerM: null },
    ]);
  });

  it('shows lengths in inches and rates in kgf/mm, reading a decimal comma back', () => {
    const spec = SPEC;
    const values = specToForm(spec, 'Blue one', imperial) as Record<string, Record<string, string>>;
    expect(values.front.travelMm).toBe(String(Number((spec.front!.travelMm / 25.4).toFixed(3))));
    const typed = { ...values, front: { ...values.front, travelMm: '5,5' } } as never;
    expect((formToSpec(typed, imperial, spec).front as { travelMm?: number }).travelMm).toBeCloseTo(139.7, 9);
  });
});
