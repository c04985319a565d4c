/**
 * Unit conversions at the edges (the engine works in mm, kg, N, N/mm). Each factor is asked of
 * mathjs once and cached, so converting a form full of numbers stays cheap. Only the unit
 * factories are pulled in, to keep the web bundle small.
 */

import { create, createUnitDependencies, unitDependencies } from 'mathjs';

const math = create({ unitDependencies, createUnitDependencies });

// mathjs has kgf and lbf but no slug; NIST SP 811 (2008) B.8 defines it as lbf*s^2/ft (1.459390 E+01 kg).
math.createUnit('slug', '1 lbf s^2 / ft');

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
    factor = math.unit(1, from).toNumber(to);
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
