import { Link } from 'expo-router';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import type { TestRideView } from '@shared/types/test-ride';

import { END_WORDS } from './ride-words';

export type NoChangeCardProps = {
  /** A ride whose report got no damper change: a referral to the spring, or nothing left to try. */
  ride: TestRideView;
  /** Whether this account may open the rider's result screens (the desk has its own). */
  canOpenResults: boolean;
};

/** The loop's answer when it proposes no damper change, in the server's words. */
export function NoChangeCard({ ride, canOpenResults }: NoChangeCardProps) {
  const { proposal } = ride;
  if (proposal.kind === 'change') return null;
  const spring = proposal.kind === 'spring';
  return (
    <Card tone={spring ? 'warning' : 'plain'} testID={spring ? 'ride-spring' : 'ride-none'}>
      <ThemedText type="overline" color="textMuted">
        {END_WORDS[ride.end]} · {ride.symptom.words}
      </ThemedText>
      <ThemedText type="heading">{spring ? 'Look at the spring first' : 'No damper change to try'}</ThemedText>
      <ThemedText>{proposal.reason}</ThemedText>
      {spring && proposal.recordId !== null && canOpenResults && (
        <Link href={`/rider/results/${proposal.recordId}`} asChild>
          <Button variant="secondary" label="Open the bike’s latest result" testID="ride-spring-result" />
        </Link>
      )}
    </Card>
  );
}
