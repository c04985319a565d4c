import { View } from 'react-native';

import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import type { TestRideView } from '@shared/types/test-ride';
import { useTheme, type ColorName } from '@/theme';

import { END_WORDS } from './ride-words';

/** The verdict at a glance: a worse change still on the bike in red, a better one in green. */
function statusColor(ride: TestRideView): ColorName {
  if (ride.status === 'judged' && ride.outcome?.outcome === 'worse') return 'danger';
  if (ride.status === 'judged' && ride.outcome?.outcome === 'better') return 'success';
  return 'textMuted';
}

/** Every report, newest first: what the bike did, the change proposed, where it stands and how it rode. */
export function RideHistory({ rides }: { rides: readonly TestRideView[] }) {
  const { spacing } = useTheme();
  return (
    <View style={{ gap: spacing.sm }} testID="ride-history">
      <ThemedText type="heading">Test rides so far</ThemedText>
      {rides.length === 0 ? (
        <ThemedText color="textMuted">None yet. After a ride, report what the bike did above.</ThemedText>
      ) : (
        rides.map((ride) => (
          <Card key={ride.id} testID={`ride-${ride.id}`}>
            <ThemedText type="overline" color="textMuted">
              {new Date(ride.reported.at).toLocaleString()} · {END_WORDS[ride.end]}
            </ThemedText>
            <ThemedText type="bodyStrong">
              {ride.symptom.words} ({ride.strength})
            </ThemedText>
            {ride.note ? <ThemedText color="textMuted">“{ride.note}”</ThemedText> : null}
            {/* While it waits to be made, the status already says the change in full. */}
            {ride.proposal.kind === 'change' && ride.status !== 'to-make' && <ThemedText testID={`ride-${ride.id}-change`}>{ride.proposal.change.instruction}</ThemedText>}
            {ride.outcome?.note ? <ThemedText color="textMuted">After the ride: “{ride.outcome.note}”</ThemedText> : null}
            <ThemedText color={statusColor(ride)} testID={`ride-${ride.id}-status`}>
              {ride.statusText}
            </ThemedText>
          </Card>
        ))
      )}
    </View>
  );
}
