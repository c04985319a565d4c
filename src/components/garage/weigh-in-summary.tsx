import { Link } from 'expo-router';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { useWeighIn } from '@/hooks/use-weigh-in';

/** The rider's weigh-in in one card: total with gear, and the way to change it. */
export function WeighInSummary() {
  const { data } = useWeighIn();
  const totals = data?.totals;
  return (
    <Card testID="weigh-in-summary">
      <ThemedText type="bodyStrong">Weigh-in</ThemedText>
      {totals ? (
        <ThemedText>
          Body, gear and luggage: <Quantity value={(data?.weighIn?.bodyKg ?? 0) + totals.gearKg + totals.luggageKg} kind="mass" />
        </ThemedText>
      ) : (
        <ThemedText color="textMuted">Not weighed in yet: sag and springs depend on what you weigh in your gear.</ThemedText>
      )}
      <Link href="/rider/weigh-in" asChild>
        <Button variant="secondary" label={totals ? 'Change weigh-in' : 'Weigh in'} testID="open-weigh-in" />
      </Link>
    </Card>
  );
}
