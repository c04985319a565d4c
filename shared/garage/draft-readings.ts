/** A draft's answers as the engine's readings, once every length of an end has been taken. */

import type { DraftEndReadings, DraftLengthReading } from '../types/garage';
import type { LengthReading, Readings } from '../types/sizing';

function completeReading(reading: DraftLengthReading | undefined): LengthReading | null {
  if (typeof reading === 'number') return reading;
  if (reading && typeof reading.pushedMm === 'number' && typeof reading.liftedMm === 'number') {
    return { pushedMm: reading.pushedMm, liftedMm: reading.liftedMm };
  }
  return null;
}

/** The readings, or null while a length (or half of a pushed/lifted pair) is still missing. */
export function completeReadings(answers: DraftEndReadings | undefined): Readings | null {
  if (!answers || typeof answers.extendedMm !== 'number') return null;
  const staticMm = completeReading(answers.staticMm);
  const riderMm = completeReading(answers.riderMm);
  return staticMm === null || riderMm === null ? null : { extendedMm: answers.extendedMm, staticMm, riderMm };
}
