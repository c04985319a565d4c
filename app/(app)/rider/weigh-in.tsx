import { router } from 'expo-router';

import { WeighInForm } from '@/components/garage/weigh-in-form';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useTargetProfiles } from '@/hooks/use-target-profiles';
import { useWeighIn } from '@/hooks/use-weigh-in';

/** The rider's weigh-in, kept on the profile for every bike. */
export default function WeighInScreen() {
  const weighIn = useWeighIn();
  const profiles = useTargetProfiles();
  const error = weighIn.error ?? profiles.error;
  return (
    <Screen>
      <ThemedText type="title">Weigh-in</ThemedText>
      {error ? (
        <ErrorState title="The weigh-in could not be loaded" message={error.message} onRetry={() => void Promise.all([weighIn.mutate(), profiles.mutate()])} />
      ) : !weighIn.data || !profiles.data ? (
        <LoadingState label="Loading your weigh-in…" />
      ) : (
        <WeighInForm
          weighIn={weighIn.data.weighIn}
          profiles={profiles.data.profiles}
          submitLabel="Save weigh-in"
          onSubmit={async (value) => {
            await weighIn.save(value);
            router.navigate('/rider');
          }}
        />
      )}
    </Screen>
  );
}
