import { Link, router, useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';

import { BikeForm } from '@/components/garage/bike-form';
import { LoadCasePanel } from '@/components/garage/load-case-panel';
import { DampersSummary } from '@/components/test-ride/dampers-summary';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useBike, useBikeChanges } from '@/hooks/use-bikes';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useTheme } from '@/theme';

/** A bike's values, to correct (corrections are not logged: changes go in the setup log). */
export default function BikeDetailScreen() {
  const { spacing } = useTheme();
  const bikeId = Number(useLocalSearchParams<{ bikeId: string }>().bikeId);
  const { data, error, mutate } = useBike(bikeId);
  const { update, remove } = useBikeChanges();
  const kinds = useDamperKinds().data?.kinds;
  if (error) {
    return (
      <Screen>
        <ErrorState title="The bike could not be loaded" message={error.message} onRetry={() => void mutate()} />
      </Screen>
    );
  }
  if (!data) {
    return (
      <Screen>
        <LoadingState label="Loading the bike…" />
      </Screen>
    );
  }
  const { bike } = data;
  return (
    <Screen>
      <ThemedText type="title">{bike.nickname}</ThemedText>
      <ThemedText color="textMuted">
        {bike.model ? `From the shop model ${bike.model.name}.` : 'Entered by hand.'} Correct a value here; when you turn an adjuster or fit a spring, record it in the setup log instead so it can be undone.
      </ThemedText>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        <Link href={`/rider/bikes/${bike.id}/ride`} asChild>
          <Button label="Test ride" testID="open-test-ride" />
        </Link>
        <Link href={`/rider/bikes/${bike.id}/log`} asChild>
          <Button variant="secondary" label="Setup log" />
        </Link>
        <Button
          variant="secondary"
          label="Remove from garage"
          onPress={() => void remove(bike.id).then(() => router.navigate('/rider'))}
        />
      </View>
      <LoadCasePanel bike={bike} />
      <DampersSummary bike={bike} kinds={kinds}>
        <ThemedText color="textMuted">After a ride, the test ride proposes one change at a time, and shows the way back to the maker’s standard or to your baseline.</ThemedText>
        <Link href={`/rider/bikes/${bike.id}/ride`} asChild>
          <Button variant="secondary" label="Test ride and the way back" />
        </Link>
      </DampersSummary>
      <BikeForm spec={bike} nickname={bike.nickname} submitLabel="Save corrections" onSubmit={(values) => update(bike.id, values)} />
    </Screen>
  );
}
