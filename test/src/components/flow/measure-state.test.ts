import { initialMeasureState, measureReducer, neighbourStep, steps, stepsFor } from '@/components/flow/measure-state';

describe('the measuring flow’s reducer', () => {
  it('walks only the steps of the chosen ends', () => {
    expect(stepsFor(['rear'])).toEqual(['weigh-in', 'ends', 'rear-extended', 'rear-static', 'rear-rider', 'review']);
    expect(stepsFor(['front', 'rear'])).toEqual([...steps]);
    expect(neighbourStep(['rear'], 'ends', 1)).toBe('rear-extended');
    expect(neighbourStep(['rear'], 'rear-extended', -1)).toBe('ends');
    expect(neighbourStep(['front', 'rear'], 'front-rider', 1)).toBe('rear-extended');
    expect(neighbourStep(['rear'], 'review', 1)).toBeNull();
  });

  it('keeps every answer while moving between steps', () => {
    let state = measureReducer(initialMeasureState, { type: 'weigh-in-confirmed' });
    state = measureReducer(state, { type: 'ends-chosen', ends: ['front'] });
    state = measureReducer(state, { type: 'reading-taken', end: 'front', field: 'extendedMm', value: 560 });
    state = measureReducer(state, { type: 'reading-taken', end: 'front', field: 'staticMm', value: { pushedMm: 532, liftedMm: 540 } });
    state = measureReducer(state, { type: 'moved', step: 'front-extended' });
    expect(state).toEqual({
      step: 'front-extended',
      hints: null,
      answers: { weighInConfirmed: true, ends: ['front'], front: { extendedMm: 560, staticMm: { pushedMm: 532, liftedMm: 540 } } },
    });
  });

  it('starts from a saved draft', () => {
    const draft = {
      bikeId: 1,
      step: 'rear-static' as const,
      answers: { ends: ['rear' as const], rear: { extendedMm: 600 } },
      hints: null,
      createdAt: '',
      updatedAt: '',
    };
    expect(measureReducer(initialMeasureState, { type: 'loaded', draft })).toEqual({ step: 'rear-static', answers: draft.answers, hints: null });
  });
});
