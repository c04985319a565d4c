/**
 * The rate of a helical compression spring from its wire and coils, so the parts counter can
 * identify an unlabelled spring: k = G d^4 / (8 D^3 Na) (Shigley's Mechanical Engineering Design,
 * ch. 10, from memory). With G in N/mm^2 and d, D in mm, k comes out in N/mm. D is the mean coil
 * diameter, the outer diameter less one wire diameter. The formula does not hold for a
 * variable-pitch (progressive) spring.
 */

export type SpringMaterial = 'music-wire' | 'chrome-silicon' | 'chrome-vanadium' | 'titanium';

export const SPRING_MATERIALS: readonly SpringMaterial[] = ['music-wire', 'chrome-silicon', 'chrome-vanadium', 'titanium'];

export interface MaterialModulus {
  label: string;
  /** The shear modulus G used, N/mm^2 (MPa). */
  shearModulusMpa: number;
  /** The spread of G quoted for the material; the rate carries the same spread. */
  rangeMpa: [number, number];
}

/** G by material, from memory (the domain notes): the material must be asked, titanium is about half. */
export const SHEAR_MODULUS: Record<SpringMaterial, MaterialModulus> = {
  'music-wire': { label: 'Music wire', shearModulusMpa: 79_000, rangeMpa: [79_000, 79_000] },
  'chrome-silicon': { label: 'Chrome-silicon', shearModulusMpa: 77_000, rangeMpa: [77_000, 77_000] },
  'chrome-vanadium': { label: 'Chrome-vanadium', shearModulusMpa: 77_000, rangeMpa: [77_000, 77_000] },
  titanium: { label: 'Titanium alloy', shearModulusMpa: 43_000, rangeMpa: [42_000, 44_000] },
};

/** Closed-and-ground ends: one dead coil at each end. */
export const DEAD_COILS_CLOSED_GROUND = 2;

/** Spring index D/d outside which a spring is hard to make or buckles easily (Shigley, ch. 10, from memory). */
export const USUAL_SPRING_INDEX: [number, number] = [4, 12];

export interface HelicalSpring {
  wireDiameterMm: number;
  meanDiameterMm: number;
  activeCoils: number;
  shearModulusMpa: number;
}

export function computeMeanCoilDiameter(outerDiameterMm: number, wireDiameterMm: number): number {
  return outerDiameterMm - wireDiameterMm;
}

export function computeActiveCoilsClosedGround(totalCoils: number): number {
  return totalCoils - DEAD_COILS_CLOSED_GROUND;
}

function requirePositive(name: string, value: number): void {
  if (!(Number.isFinite(value) && value > 0)) throw new RangeError(`${name} must be a positive number, not ${value}`);
}

/** k = G d^4 / (8 D^3 Na), N/mm. */
export function computeHelicalSpringRate(spring: HelicalSpring): number {
  const { wireDiameterMm: d, meanDiameterMm: D, activeCoils: Na, shearModulusMpa: G } = spring;
  requirePositive('The wire diameter', d);
  requirePositive('The mean coil diameter', D);
  requirePositive('The number of active coils', Na);
  requirePositive('The shear modulus', G);
  return (G * d ** 4) / (8 * D ** 3 * Na);
}

export interface SpringMeasurement {
  wireDiameterMm: number;
  outerDiameterMm: number;
  /** Active coils; or give totalCoils of a spring with closed-and-ground ends. */
  activeCoils?: number;
  totalCoils?: number;
  material: SpringMaterial;
}

export interface SpringIdentification {
  rateNmm: number;
  /** From the material's spread of G; both ends equal when one value is quoted. */
  rateRangeNmm: [number, number];
  meanDiameterMm: number;
  activeCoils: number;
  springIndex: number;
  shearModulusMpa: number;
}

/** The rate of a measured spring, with what it was computed from. */
export function identifySpring(measured: SpringMeasurement): SpringIdentification {
  const activeCoils = measured.activeCoils ?? computeActiveCoilsClosedGround(measured.totalCoils ?? NaN);
  const meanDiameterMm = computeMeanCoilDiameter(measured.outerDiameterMm, measured.wireDiameterMm);
  const modulus = SHEAR_MODULUS[measured.material];
  const rateAt = (shearModulusMpa: number) =>
    computeHelicalSpringRate({ wireDiameterMm: measured.wireDiameterMm, meanDiameterMm, activeCoils, shearModulusMpa });
  return {
    rateNmm: rateAt(modulus.shearModulusMpa),
    rateRangeNmm: [rateAt(modulus.rangeMpa[0]), rateAt(modulus.rangeMpa[1])],
    meanDiameterMm,
    activeCoils,
    springIndex: meanDiameterMm / measured.wireDiameterMm,
    shearModulusMpa: modulus.shearModulusMpa,
  };
}
