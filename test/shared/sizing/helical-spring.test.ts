/**
 * The helical compression spring rate k = G d^4 / (8 D^3 Na) (Shigley's Mechanical Engineering
 * Design, ch. 10, from memory), checked against hand calculations written out below, and its
 * sensitivity to the wire diameter (the domain notes: 1 % in d is about 4 % in k).
 */
import * as fc from 'fast-check';
import {
  computeActiveCoilsClosedGround,
  computeHelicalSpringRate,
  computeMeanCoilDiameter,
  identifySpring,
  SHEAR_MODULUS,
} from '@shared/sizing';

describe('the rate formula against hand calculations', () => {
  it('music wire, d = 5 mm, OD = 45 mm, 8 active coils: 12.0544 N/mm', () => {
    // D = OD - d = 45 - 5 = 40 mm; d^4 = 625 mm^4; D^3 = 64,000 mm^3; G = 79,000 N/mm^2.
    // k = 79,000 x 625 / (8 x 64,000 x 8) = 49,375,000 / 4,096,000 = 12.0544 N/mm.
    expect(computeMeanCoilDiameter(45, 5)).toBe(40);
    expect(computeHelicalSpringRate({ wireDiameterMm: 5, meanDiameterMm: 40, activeCoils: 8, shearModulusMpa: 79_000 })).toBeCloseTo(12.0544, 4);
    const found = identifySpring({ wireDiameterMm: 5, outerDiameterMm: 45, activeCoils: 8, material: 'music-wire' });
    expect(found.rateNmm).toBeCloseTo(12.0544, 4);
    expect(found.springIndex).toBe(8);
  });

  it('titanium, d = 10 mm, OD = 70 mm, 10 coils with closed-and-ground ends: 31.105 N/mm, 30.38-31.83 over G 42-44 GPa', () => {
    // Na = 10 - 2 = 8; D = 70 - 10 = 60 mm; d^4 = 10,000; D^3 = 216,000; G = 43,000 N/mm^2 (the middle of 42-44 GPa).
    // k = 43,000 x 10,000 / (8 x 216,000 x 8) = 430,000,000 / 13,824,000 = 31.1053 N/mm.
    // Over G: 420,000,000 / 13,824,000 = 30.3819 and 440,000,000 / 13,824,000 = 31.8287 N/mm.
    expect(computeActiveCoilsClosedGround(10)).toBe(8);
    const found = identifySpring({ wireDiameterMm: 10, outerDiameterMm: 70, totalCoils: 10, material: 'titanium' });
    expect(found.activeCoils).toBe(8);
    expect(found.meanDiameterMm).toBe(60);
    expect(found.rateNmm).toBeCloseTo(31.1053, 4);
    expect(found.rateRangeNmm[0]).toBeCloseTo(30.3819, 4);
    expect(found.rateRangeNmm[1]).toBeCloseTo(31.8287, 4);
  });

  it('chrome-silicon and chrome-vanadium share G = 77 GPa; music wire 79 GPa (from memory)', () => {
    expect(SHEAR_MODULUS['chrome-silicon'].shearModulusMpa).toBe(77_000);
    expect(SHEAR_MODULUS['chrome-vanadium'].shearModulusMpa).toBe(77_000);
    expect(SHEAR_MODULUS['music-wire'].shearModulusMpa).toBe(79_000);
    // Same wire and coils, the rate goes with G: 77/79 of the music-wire spring above.
    const chromeSilicon = identifySpring({ wireDiameterMm: 5, outerDiameterMm: 45, activeCoils: 8, material: 'chrome-silicon' });
    expect(chromeSilicon.rateNmm).toBeCloseTo((12.0544 * 77) / 79, 3);
  });

  it('refuses a spring that cannot exist instead of answering NaN', () => {
    expect(() => computeHelicalSpringRate({ wireDiameterMm: 5, meanDiameterMm: 0, activeCoils: 8, shearModulusMpa: 79_000 })).toThrow(RangeError);
    expect(() => identifySpring({ wireDiameterMm: 5, outerDiameterMm: 45, totalCoils: 2, material: 'music-wire' })).toThrow(RangeError);
  });
});

describe('properties (fast-check)', () => {
  const spring = fc.record({
    wireDiameterMm: fc.double({ min: 0.5, max: 20, noNaN: true }),
    meanDiameterMm: fc.double({ min: 5, max: 150, noNaN: true }),
    activeCoils: fc.double({ min: 2, max: 60, noNaN: true }),
    shearModulusMpa: fc.constantFrom(79_000, 77_000, 43_000),
  });

  it('a 1 % error in the wire diameter is about 4 % in the rate: (1.01)^4 = 1.0406', () => {
    fc.assert(
      fc.property(spring, (s) => {
        const ratio = computeHelicalSpringRate({ ...s, wireDiameterMm: s.wireDiameterMm * 1.01 }) / computeHelicalSpringRate(s);
        expect(ratio).toBeCloseTo(1.04060401, 9);
      }),
    );
  });

  it('twice the active coils halve the rate; twice the mean diameter divide it by 8', () => {
    fc.assert(
      fc.property(spring, (s) => {
        const k = computeHelicalSpringRate(s);
        expect(computeHelicalSpringRate({ ...s, activeCoils: s.activeCoils * 2 }) / k).toBeCloseTo(0.5, 12);
        expect(computeHelicalSpringRate({ ...s, meanDiameterMm: s.meanDiameterMm * 2 }) / k).toBeCloseTo(0.125, 12);
      }),
    );
  });
});
