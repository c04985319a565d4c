/**
 * The desk's readings of a bike in the shop: the three lengths of each end on one form, checked
 * with the measuring flow's own reading check (the draft schema: physical range, the order
 * extended ≥ static ≥ rider, the sags against the travel), then turned into the engine's readings.
 */
import { fieldOf, checkReading, readingFrom, type ReadingErrors, type ReadingTexts } from '@/components/flow/reading-check';
import type { Stage } from '@/components/flow/step-texts';
import { completeReadings } from '@shared/garage/draft-readings';
import type { DisplayUnits, DraftEndReadings, DraftLengthReading } from '@shared/types/garage';
import type { EndKind, Readings } from '@shared/types/sizing';

export const STAGES = ['extended', 'static', 'rider'] as const satisfies readonly Stage[];

export type EndTexts = Record<Stage, ReadingTexts>;

export type ShopReadingTexts = Record<EndKind, EndTexts>;

export type ShopReadingErrors = Partial<Record<EndKind, Partial<Record<Stage, ReadingErrors>>>>;

const emptyReading = (): ReadingTexts => ({ value: '', pushed: '', lifted: '', mode: 'pair' });

export function emptyShopReadings(): ShopReadingTexts {
  const end = (): EndTexts => ({ extended: emptyReading(), static: emptyReading(), rider: emptyReading() });
  return { front: end(), rear: end() };
}

/** One end's typed lengths in mm, as the draft schema reads them; a box not yet filled is left out. */
export function endAnswers(texts: EndTexts, units: DisplayUnits): DraftEndReadings {
  const answers: DraftEndReadings = {};
  for (const stage of STAGES) {
    const field = fieldOf(stage);
    const reading = readingFrom(texts[stage], field, units);
    if (field === 'extendedMm') {
      if (reading !== undefined) answers.extendedMm = reading as number;
    } else {
      answers[field] = reading as DraftLengthReading;
    }
  }
  return answers;
}

export type ShopReadingCheck = {
  ends: readonly EndKind[];
  texts: ShopReadingTexts;
  travelMm: Partial<Record<EndKind, number>>;
  units: DisplayUnits;
  /** On saving every box must be filled; while typing an empty box is fine. */
  complete: boolean;
};

/** Errors per end and stage, in the shape of the form's values; only the ends being measured count. */
export function checkShopReadings({ ends, texts, travelMm, units, complete }: ShopReadingCheck): ShopReadingErrors {
  const errors: ShopReadingErrors = {};
  for (const end of ends) {
    const answers = { [end]: endAnswers(texts[end], units) };
    for (const stage of STAGES) {
      const found = checkReading({ end, field: fieldOf(stage), texts: texts[end][stage], answers, travelMm: travelMm[end], units, complete });
      if (Object.keys(found).length > 0) (errors[end] ??= {})[stage] = found;
    }
  }
  return errors;
}

/** The engine's readings for the ends measured, or null while one of them is incomplete. */
export function shopReadingsFrom(ends: readonly EndKind[], texts: ShopReadingTexts, units: DisplayUnits): Partial<Record<EndKind, Readings>> | null {
  const readings: Partial<Record<EndKind, Readings>> = {};
  for (const end of ends) {
    const complete = completeReadings(endAnswers(texts[end], units));
    if (!complete) return null;
    readings[end] = complete;
  }
  return readings;
}
