import { Link, router } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useStartDraft } from '@/hooks/use-draft';
import type { GarageBike } from '@shared/types/garage';
import { useTheme } from '@/theme';

import { EndSummaryLine } from './end-summary-line';
import { stepHref } from './flow-href';

/** A bike in the garage: what it is, its last pass, and the way into measuring it. */
export function BikeCard({ bike }: { bike: GarageBike }) {
  const { spacing } = useTheme();
  const [starting, setStarting] = useState(false);
  const startDraft = useStartDraft();
  const last = bike.lastSizing;

  async function measure() {
    setStarting(true);
    try {
      await startDraft(bike.id, false);
      router.push(stepHref(bike.id, 'weigh-in'));
    } finally {
      setStarting(false);
    }
  }

  return (
    <Card testID={`bike-${bike.id}`}>
      <ThemedText type="heading">{bike.nickname}</ThemedText>
      <ThemedText color="textMuted">{bike.model ? bike.model.name : 'Entered by hand'}</ThemedText>
      {last ? (
        <View style={{ gap: spacing.xs }}>
          <ThemedText type="caption" color="textMuted">
            Last measured {new Date(last.createdAt).toLocaleDateString()}
          </ThemedText>
          {last.front && <EndSummaryLine end="front" summary={last.front} />}
          {last.rear && <EndSummaryLine end="rear" summary={last.rear} />}
        </View>
      ) : (
        <ThemedText color="textMuted">Not measured yet.</ThemedText>
      )}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        {bike.draft ? (
          <Link href={stepHref(bike.id, bike.draft.step)} asChild>
            <Button label="Resume measuring" testID={`resume-${bike.id}`} />
          </Link>
        ) : (
          <Button
            label={starting ? 'Starting…' : 'Measure sag'}
            disabled={starting}
            onPress={() => void measure()}
            testID={`measure-${bike.id}`}
          />
        )}
        {last && (
          <Link href={`/rider/results/${last.id}`} asChild>
            <Button variant="secondary" label="Last result" />
          </Link>
        )}
        <Link href={`/rider/bikes/${bike.id}/log`} asChild>
          <Button variant="secondary" label="Setup log" testID={`log-${bike.id}`} />
        </Link>
        <Link href={`/rider/bikes/${bike.id}`} asChild>
          <Button variant="secondary" label="Details" />
        </Link>
      </View>
    </Card>
  );
}
