import { computeParallelRate, computeSeriesRate } from '@shared/sizing';

// Springs in parallel add rates, in series their compliances add (any mechanics text; section 8).
describe('springs combined', () => {
  it('in parallel the rates add: two 9 N/mm fork springs make 18 N/mm', () => {
    expect(computeParallelRate([9, 9])).toBe(18);
    expect(computeParallelRate([6, 10, 4])).toBe(20);
  });

  it('in series the compliances add: 1/k = 1/10 + 1/40 = 0.125, so k = 8 N/mm', () => {
    expect(computeSeriesRate([10, 40])).toBeCloseTo(8, 12);
    // Two equal springs stacked halve the rate: 1/k = 2/100.
    expect(computeSeriesRate([100, 100])).toBeCloseTo(50, 12);
    expect(computeSeriesRate([95])).toBe(95);
  });

  it('refuses an empty list and a rate that is not positive', () => {
    expect(() => computeParallelRate([])).toThrow(RangeError);
    expect(() => computeSeriesRate([10, 0])).toThrow(/positive/);
    expect(() => computeParallelRate([10, Number.NaN])).toThrow(/positive/);
  });
});
