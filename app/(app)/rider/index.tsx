import { Link } from 'expo-router';
import { View } from 'react-native';

import { BikeCard } from '@/components/garage/bike-card';
import { WeighInSummary } from '@/components/garage/weigh-in-summary';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { UnitToggle } from '@/components/units/unit-toggle';
import { useBikes } from '@/hooks/use-bikes';
import { useTheme } from '@/theme';

/** The rider's landing: the bikes, each with its last pass, the weigh-in and the units. */
export default function GarageScreen() {
  const { spacing } = useTheme();
  const { data, error, isValidating, mutate } = useBikes();
  return (
    <Screen>
      <ThemedText type="title">Garage</ThemedText>
      <UnitToggle />
      <WeighInSummary />
      {error ? (
        <ErrorState title="The garage could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />
      ) : !data ? (
        <LoadingState label="Loading your bikes…" />
      ) : data.bikes.length === 0 ? (
        <EmptyState title="No bikes yet">Add your bike from the shop’s models or by hand, then measure its sag.</EmptyState>
      ) : (
        <View style={{ gap: spacing.lg }}>
          {data.bikes.map((bike) => (
            <BikeCard key={bike.id} bike={bike} />
          ))}
        </View>
      )}
      <Link href="/rider/bikes/new" asChild>
        <Button label="Add a bike" testID="add-bike" />
      </Link>
    </Screen>
  );
}
