/**
 * The measuring flow's state: the step the rider is at and the answers so far, changed only by
 * typed actions. The steps a pass walks through depend on the ends chosen.
 */
import type { DraftAnswers, DraftEndReadings, DraftHints, MeasuringDraft, MeasuringStep } from '@shared/types/garage';
import type { EndKind } from '@shared/types/sizing';

export const steps = [
  'weigh-in',
  'ends',
  'front-extended',
  'front-static',
  'front-rider',
  'rear-extended',
  'rear-static',
  'rear-rider',
  'review',
] as const satisfies readonly MeasuringStep[];

export type ReadingField = keyof DraftEndReadings;

export type MeasureState = {
  step: MeasuringStep;
  answers: DraftAnswers;
  hints: DraftHints | null;
};

export type MeasureAction =
  | { type: 'loaded'; draft: MeasuringDraft }
  | { type: 'weigh-in-confirmed' }
  | { type: 'ends-chosen'; ends: EndKind[] }
  | { type: 'reading-taken'; end: EndKind; field: ReadingField; value: DraftEndReadings[ReadingField] }
  | { type: 'moved'; step: MeasuringStep };

export const initialMeasureState: MeasureState = { step: 'weigh-in', answers: {}, hints: null };

export function measureReducer(state: MeasureState, action: MeasureAction): MeasureState {
  switch (action.type) {
    case 'loaded':
      return { step: action.draft.step, answers: action.draft.answers, hints: action.draft.hints };
    case 'weigh-in-confirmed':
      return { ...state, answers: { ...state.answers, weighInConfirmed: true } };
    case 'ends-chosen':
      return { ...state, answers: { ...state.answers, ends: action.ends } };
    case 'reading-taken': {
      const readings = { ...state.answers[action.end], [action.field]: action.value };
      return { ...state, answers: { ...state.answers, [action.end]: readings } };
    }
    case 'moved':
      return { ...state, step: action.step };
  }
}

/** The steps of this pass, in order: the per-end steps only for the ends chosen. */
export function stepsFor(ends: readonly EndKind[] | undefined): MeasuringStep[] {
  const chosen = ends ?? [];
  return steps.filter((step) => {
    const end = step.split('-')[0];
    return (end !== 'front' && end !== 'rear') || chosen.includes(end);
  });
}

export function neighbourStep(ends: readonly EndKind[] | undefined, step: MeasuringStep, offset: 1 | -1): MeasuringStep | null {
  const list = stepsFor(ends);
  const index = list.indexOf(step);
  if (index < 0) return null;
  return list[index + offset] ?? null;
}
