import { router } from 'expo-router';
import { createContext, useContext, useReducer, type Dispatch, type ReactNode } from 'react';

import { stepHref } from '@/components/garage/flow-href';
import { useDraft } from '@/hooks/use-draft';
import type { GarageBike, MeasuringStep } from '@shared/types/garage';

import { initialMeasureState, measureReducer, type MeasureAction, type MeasureState } from './measure-state';

type MeasureFlow = {
  bike: GarageBike;
  state: MeasureState;
  dispatch: Dispatch<MeasureAction>;
  /** Applies the step's answer, saves the draft on the server, then shows the next screen. */
  moveTo: (step: MeasuringStep, action?: MeasureAction) => Promise<void>;
};

const MeasureFlowContext = createContext<MeasureFlow | null>(null);

export function useMeasureFlow(): MeasureFlow {
  const flow = useContext(MeasureFlowContext);
  if (!flow) throw new Error('useMeasureFlow is for the screens of the measuring flow.');
  return flow;
}

export function MeasureFlowProvider({ bike, initial, children }: { bike: GarageBike; initial: MeasureState; children: ReactNode }) {
  const [state, dispatch] = useReducer(measureReducer, initial ?? initialMeasureState);
  const { save } = useDraft(bike.id);

  async function moveTo(step: MeasuringStep, action?: MeasureAction) {
    // The reducer is pure, so the answers to save are worked out here rather than read after the render.
    const answered = action ? measureReducer(state, action) : state;
    await save(step, answered.answers);
    if (action) dispatch(action);
    dispatch({ type: 'moved', step });
    router.replace(stepHref(bike.id, step));
  }

  return <MeasureFlowContext.Provider value={{ bike, state, dispatch, moveTo }}>{children}</MeasureFlowContext.Provider>;
}
