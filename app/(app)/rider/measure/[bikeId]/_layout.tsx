import { Stack, useLocalSearchParams } from 'expo-router';
import { useEffect, useState } from 'react';

import { MeasureFlowProvider } from '@/components/flow/measure-context';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { useBike } from '@/hooks/use-bikes';
import { useDraft, useStartDraft } from '@/hooks/use-draft';
import { useTargetProfiles } from '@/hooks/use-target-profiles';
import { useUnits } from '@/hooks/use-units';
import { useWeighIn } from '@/hooks/use-weigh-in';

/**
 * Holds the measuring flow's state for all its steps, so answers survive moving between them.
 * The state starts from the draft on the server; a bike without one gets a fresh draft.
 */
export default function MeasureLayout() {
  const bikeId = Number(useLocalSearchParams<{ bikeId: string }>().bikeId);
  const bike = useBike(bikeId);
  const draft = useDraft(bikeId);
  // The first step needs these too: asked beside the bike and the draft, not after its screen loads.
  useWeighIn();
  useTargetProfiles();
  useUnits();
  const startDraft = useStartDraft();
  const [startError, setStartError] = useState<Error | null>(null);
  const missing = draft.data && draft.data.draft === null;

  useEffect(() => {
    if (!missing) return;
    startDraft(bikeId, false).catch((error: Error) => setStartError(error));
    // Once per bike that has no draft; startDraft is a new function every render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [missing, bikeId]);

  const error = bike.error ?? draft.error ?? startError;
  if (error) {
    return (
      <Screen>
        <ErrorState title="The measuring could not be opened" message={error.message} onRetry={() => void Promise.all([bike.mutate(), draft.mutate()])} />
      </Screen>
    );
  }
  const loaded = draft.data?.draft;
  if (!bike.data || !loaded) {
    return (
      <Screen>
        <LoadingState label="Opening where you left off…" />
      </Screen>
    );
  }
  return (
    <MeasureFlowProvider bike={bike.data.bike} initial={{ step: loaded.step, answers: loaded.answers, hints: loaded.hints }}>
      <Stack screenOptions={{ headerShown: false }} />
    </MeasureFlowProvider>
  );
}
