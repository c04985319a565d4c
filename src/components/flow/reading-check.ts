/**
 * One step's reading, typed in the person's units, as the draft holds it (mm), checked with the
 * draft's shared schema against the readings already taken: the physical range, the order of
 * the lengths (extended ≥ static ≥ rider) and the sags against the travel.
 */
import { ValidationError } from 'yup';

import { draftAnswersSchema } from '@shared/schemas/draft.schema';
import type { DisplayUnits, DraftAnswers, DraftEndReadings } from '@shared/types/garage';
import type { EndKind } from '@shared/types/sizing';

import { fromFieldText } from '../units/format';
import type { ReadingField } from './measure-state';

export type ReadingMode = 'pair' | 'single';

export type ReadingTexts = { value: string; pushed: string; lifted: string; mode: ReadingMode };

export type ReadingErrors = Partial<Record<'value' | 'pushed' | 'lifted', string>>;

export function fieldOf(stage: 'extended' | 'static' | 'rider'): ReadingField {
  return stage === 'extended' ? 'extendedMm' : stage === 'static' ? 'staticMm' : 'riderMm';
}

/** The typed reading in mm; text that is not a number is kept so the schema names it. */
export function readingFrom(texts: ReadingTexts, field: ReadingField, units: DisplayUnits) {
  if (field === 'extendedMm' || texts.mode === 'single') return fromFieldText(texts.value, 'length', units);
  return { pushedMm: fromFieldText(texts.pushed, 'length', units), liftedMm: fromFieldText(texts.lifted, 'length', units) };
}

const MISSING: Record<keyof ReadingErrors, string> = {
  value: 'Enter the length you measured.',
  pushed: 'Enter the length after pushing down.',
  lifted: 'Enter the length after lifting.',
};

export type CheckInput = {
  end: EndKind;
  field: ReadingField;
  texts: ReadingTexts;
  answers: DraftAnswers;
  travelMm: number | undefined;
  units: DisplayUnits;
  /** On Next every box must be filled; while typing an empty box is fine. */
  complete: boolean;
};

export function checkReading({ end, field, texts, answers, travelMm, units, complete }: CheckInput): ReadingErrors {
  const errors: ReadingErrors = {};
  const pair = field !== 'extendedMm' && texts.mode === 'pair';
  if (complete) {
    for (const key of pair ? (['pushed', 'lifted'] as const) : (['value'] as const)) {
      if (texts[key].trim() === '') errors[key] = MISSING[key];
    }
  }
  const readings: DraftEndReadings = { ...answers[end], [field]: readingFrom(texts, field, units) };
  const candidate = { ...answers, [end]: readings };
  try {
    draftAnswersSchema.validateSync(candidate, { abortEarly: false, context: { travelMm: { [end]: travelMm } } });
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    const at = `${end}.${field}`;
    for (const inner of error.inner) {
      if (!inner.path?.startsWith(at)) continue;
      const key = inner.path.endsWith('pushedMm') ? 'pushed' : inner.path.endsWith('liftedMm') ? 'lifted' : 'value';
      errors[key] ??= inner.message;
    }
  }
  return errors;
}
