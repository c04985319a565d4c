/**
 * Sags from the three readings. A loaded reading taken twice (pushed down and let rise, lifted and
 * let settle) is averaged; half the spread is the friction band.
 */

import type { LengthReading, Readings } from '../types/sizing';

/**
 * Readings closer than this are the same length (mm): far below what a tape shows, far above the
 * float noise of a mean (500.2 and 500.4 average to 500.29999999999995).
 */
export const SAME_LENGTH_MM = 1e-6;

export interface MeasuredSags {
  staticSagMm: number;
  riderSagMm: number;
  /** Plus or minus; null for a single reading. */
  staticBandMm: number | null;
  riderBandMm: number | null;
  staticSpreadMm: number | null;
  riderSpreadMm: number | null;
  /** A pair whose pushed reading is the longer one: friction cannot do that, the two were swapped or misread. */
  swappedPairs: ('static' | 'rider')[];
}

/** What spoils a reading, for the measuring steps. */
export const READING_PITFALLS: readonly string[] = [
  'the side stand touching the ground',
  'the helper leaning on the bike instead of only steadying it',
  'the rider not in riding position with feet on the pegs',
  'tyre pressures not set',
];

export function averageReading(reading: LengthReading): number {
  return typeof reading === 'number' ? reading : (reading.pushedMm + reading.liftedMm) / 2;
}

function spreadOf(reading: LengthReading): number | null {
  return typeof reading === 'number' ? null : Math.abs(reading.liftedMm - reading.pushedMm);
}

function isSwapped(reading: LengthReading): boolean {
  return typeof reading !== 'number' && reading.pushedMm > reading.liftedMm;
}

/**
 * Why the sags cannot calibrate the loads, or null when they can. A reading that shows the end
 * topped out or bottomed out gives only a bound, and with no more sag aboard than without there is
 * no rider load to read.
 */
export function findUncalibratable(
  measured: Pick<MeasuredSags, 'staticSagMm' | 'riderSagMm'>,
  travelMm: number,
): 'topped-out' | 'bottomed-out' | 'no-rider-sag' | null {
  if (!(measured.staticSagMm >= SAME_LENGTH_MM)) return 'topped-out';
  if (!(measured.riderSagMm <= travelMm - SAME_LENGTH_MM)) return 'bottomed-out';
  if (!(measured.riderSagMm - measured.staticSagMm >= SAME_LENGTH_MM)) return 'no-rider-sag';
  return null;
}

export function measureSags(readings: Readings): MeasuredSags {
  const staticSpreadMm = spreadOf(readings.staticMm);
  const riderSpreadMm = spreadOf(readings.riderMm);
  const swappedPairs: ('static' | 'rider')[] = [];
  if (isSwapped(readings.staticMm)) swappedPairs.push('static');
  if (isSwapped(readings.riderMm)) swappedPairs.push('rider');
  return {
    staticSagMm: readings.extendedMm - averageReading(readings.staticMm),
    riderSagMm: readings.extendedMm - averageReading(readings.riderMm),
    staticBandMm: staticSpreadMm === null ? null : staticSpreadMm / 2,
    riderBandMm: riderSpreadMm === null ? null : riderSpreadMm / 2,
    staticSpreadMm,
    riderSpreadMm,
    swappedPairs,
  };
}
