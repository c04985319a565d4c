import { Link, useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';

import { RideLoop } from '@/components/test-ride/ride-loop';
import { Button } from '@/components/ui/button';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useBike } from '@/hooks/use-bikes';
import { useTheme } from '@/theme';

/** The test-ride loop of one bike: ride, say what it did, try one damper change, judge it, and the way back. */
export default function TestRideScreen() {
  const { spacing } = useTheme();
  const bikeId = Number(useLocalSearchParams<{ bikeId: string }>().bikeId);
  const bike = useBike(bikeId);
  return (
    <Screen>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        <Link href={`/rider/bikes/${bikeId}`} asChild>
          <Button variant="secondary" label="← The bike" />
        </Link>
        <Link href={`/rider/bikes/${bikeId}/log`} asChild>
          <Button variant="secondary" label="Setup log" />
        </Link>
      </View>
      <ThemedText type="title">Test ride</ThemedText>
      {bike.data && <ThemedText color="textMuted">{bike.data.bike.nickname}</ThemedText>}
      <ThemedText>
        Ride a loop you know, then say what the bike did. You get one damper change to try; make it, ride the same loop, and say whether it was better, worse or the same. A change that rode worse is turned back before the next.
      </ThemedText>
      <RideLoop bikeId={bikeId} />
      <SafetyNotice />
    </Screen>
  );
}
