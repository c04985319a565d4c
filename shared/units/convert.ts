/**
 * Unit conversions at the edges (the engine works in mm, kg, N, N/mm). Each factor is asked of
 * mathjs once and cached, so converting a form full of numbers stays cheap.
 *
 * The instance is assembled from factories to keep the web bundle small: mathjs's Unit class and
 * the two functions used here, over the number-only arithmetic of `mathjs/number`. The full
 * arithmetic the Unit class would otherwise pull in also handles matrices, which brings mathjs's
 * matrix types along (about 10 KB gzipped) for values that are only ever plain numbers here.
 */

import { create, createBigNumberClass, createComplexClass, createCreateUnit, createFractionClass, createUnitClass, createUnitFunction } from 'mathjs';
import {
  createAbs,
  createAddScalar,
  createCeil,
  createDivideScalar,
  createEqual,
  createEqualScalar,
  createFix,
  createFloor,
  createFormat,
  createIsNumeric,
  createMultiplyScalar,
  createNumber,
  createPow,
  createRound,
  createSubtractScalar,
  createTyped,
} from 'mathjs/number';

/**
 * Built on the first conversion rather than when the module loads: assembling the typed functions
 * costs a noticeable slice of a slow phone's start-up, and screens that show only SI figures
 * never convert at all.
 */
function buildUnitMath() {
  const math = create({
    createUnitClass,
    createUnitFunction,
    createCreateUnit,
    // The Unit class names these types among its dependencies, so they must exist.
    createBigNumberClass,
    createComplexClass,
    createFractionClass,
    createAbs,
    createAddScalar,
    createCeil,
    createDivideScalar,
    createEqual,
    createEqualScalar,
    createFix,
    createFloor,
    createFormat,
    createIsNumeric,
    createMultiplyScalar,
    createNumber,
    createPow,
    createRound,
    createSubtractScalar,
    createTyped,
  });
  // mathjs has kgf and lbf but no slug; NIST SP 811 (2008) B.8 defines it as lbf*s^2/ft (1.459390 E+01 kg).
  math.createUnit('slug', '1 lbf s^2 / ft');
  return math;
}

let unitMath: ReturnType<typeof buildUnitMath> | undefined;

export type LengthUnit = 'mm' | 'in';
export type MassUnit = 'kg' | 'lb' | 'slug';
export type ForceUnit = 'N' | 'kgf' | 'lbf';
export type RateUnit = 'N/mm' | 'kgf/mm' | 'lbf/in';
export type DisplayUnit = LengthUnit | MassUnit | ForceUnit | RateUnit;

const SI_UNIT: Record<DisplayUnit, DisplayUnit> = {
  mm: 'mm',
  in: 'mm',
  kg: 'kg',
  lb: 'kg',
  slug: 'kg',
  N: 'N',
  kgf: 'N',
  lbf: 'N',
  'N/mm': 'N/mm',
  'kgf/mm': 'N/mm',
  'lbf/in': 'N/mm',
};

const factors = new Map<string, number>();

function factorBetween(from: DisplayUnit, to: DisplayUnit): number {
  const key = `${from}>${to}`;
  let factor = factors.get(key);
  if (factor === undefined) {
    unitMath ??= buildUnitMath();
    factor = unitMath.unit(1, from).toNumber(to);
    factors.set(key, factor);
  }
  return factor;
}

export function convertUnit(value: number, from: LengthUnit, to: LengthUnit): number;
export function convertUnit(value: number, from: MassUnit, to: MassUnit): number;
export function convertUnit(value: number, from: ForceUnit, to: ForceUnit): number;
export function convertUnit(value: number, from: RateUnit, to: RateUnit): number;
export function convertUnit(value: number, from: DisplayUnit, to: DisplayUnit): number {
  return from === to ? value : value * factorBetween(from, to);
}

/** To the engine's unit for that quantity: mm, kg, N or N/mm. */
export function toSi(value: number, unit: DisplayUnit): number {
  return unit === SI_UNIT[unit] ? value : value * factorBetween(unit, SI_UNIT[unit]);
}

export function fromSi(value: number, unit: DisplayUnit): number {
  return unit === SI_UNIT[unit] ? value : value * factorBetween(SI_UNIT[unit], unit);
}
