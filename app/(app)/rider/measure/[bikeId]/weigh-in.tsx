import { useMeasureFlow } from '@/components/flow/measure-context';
import { FlowProgress } from '@/components/flow/flow-progress';
import { WeighInForm } from '@/components/garage/weigh-in-form';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useTargetProfiles } from '@/hooks/use-target-profiles';
import { useWeighIn } from '@/hooks/use-weigh-in';

/** First step: the weigh-in the sizing will use, confirmed or corrected. */
export default function WeighInStep() {
  const { bike, state, moveTo } = useMeasureFlow();
  const weighIn = useWeighIn();
  const profiles = useTargetProfiles();
  const error = weighIn.error ?? profiles.error;
  return (
    <Screen>
      <FlowProgress step="weigh-in" ends={state.answers.ends} />
      <ThemedText type="title">Measuring {bike.nickname}</ThemedText>
      <ThemedText>Check your weigh-in: weigh yourself in the gear you ride in.</ThemedText>
      {error ? (
        <ErrorState title="The weigh-in could not be loaded" message={error.message} onRetry={() => void weighIn.mutate()} />
      ) : !weighIn.data || !profiles.data ? (
        <LoadingState label="Loading your weigh-in…" />
      ) : (
        <WeighInForm
          weighIn={weighIn.data.weighIn}
          profiles={profiles.data.profiles}
          submitLabel="Confirm and go on"
          onSubmit={async (value) => {
            await weighIn.save(value);
            await moveTo('ends', { type: 'weigh-in-confirmed' });
          }}
        />
      )}
    </Screen>
  );
}
