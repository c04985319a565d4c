import { router } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { useSWRConfig } from 'swr';

import { riderKeys } from '@/api/keys';
import { FlowNav } from '@/components/flow/flow-nav';
import { FlowProgress } from '@/components/flow/flow-progress';
import { useMeasureFlow } from '@/components/flow/measure-context';
import { neighbourStep } from '@/components/flow/measure-state';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { createSizingRecord } from '@/hooks/use-sizing-records';
import { completeReadings } from '@shared/garage/draft-readings';
import { averageReading } from '@shared/sizing';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

function Row({ label, value, testID }: { label: string; value: number; testID: string }) {
  return (
    <View style={{ flexDirection: 'row', justifyContent: 'space-between' }}>
      <ThemedText>{label}</ThemedText>
      <Quantity value={value} kind="length" testID={testID} />
    </View>
  );
}

/** The readings of each end with the sags they give, then the sizing. */
export default function ReviewStep() {
  const { spacing } = useTheme();
  const { mutate } = useSWRConfig();
  const { bike, state, moveTo } = useMeasureFlow();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<Error | null>(null);
  const ends = state.answers.ends ?? [];
  const previous = neighbourStep(ends, 'review', -1);
  const missing = ends.filter((end) => !completeReadings(state.answers[end]));

  async function workOut() {
    setBusy(true);
    setError(null);
    try {
      const record = await createSizingRecord(bike.id, { useDraft: true });
      await Promise.all([mutate(riderKeys.bikes), mutate(riderKeys.draft(bike.id)), mutate(riderKeys.setupLog(bike.id))]);
      router.replace(`/rider/results/${record.id}`);
    } catch (cause) {
      setError(cause as Error);
      setBusy(false);
    }
  }

  const endCard = (end: EndKind) => {
    const readings = completeReadings(state.answers[end]);
    if (!readings) return null;
    const l0 = readings.extendedMm;
    const l1 = averageReading(readings.staticMm);
    const l2 = averageReading(readings.riderMm);
    return (
      <Card key={end} testID={`review-${end}`}>
        <ThemedText type="heading">{end === 'front' ? 'Front' : 'Rear'}</ThemedText>
        <Row label="Extended" value={l0} testID={`review-${end}-extended`} />
        <Row label="On its wheels (mean)" value={l1} testID={`review-${end}-static`} />
        <Row label="With you aboard (mean)" value={l2} testID={`review-${end}-rider`} />
        <Row label="Static sag" value={l0 - l1} testID={`review-${end}-static-sag`} />
        <Row label="Rider sag" value={l0 - l2} testID={`review-${end}-rider-sag`} />
      </Card>
    );
  };

  return (
    <Screen>
      <FlowProgress step="review" ends={ends} />
      <ThemedText type="title">Check the readings</ThemedText>
      <View style={{ gap: spacing.lg }}>{ends.map(endCard)}</View>
      {missing.length > 0 && (
        <Card tone="warning">
          <ThemedText>A reading of the {missing.join(' and ')} is missing: go back and take it.</ThemedText>
        </Card>
      )}
      {error && <ErrorState title="The sizing could not be worked out" message={error.message} />}
      <FlowNav
        busy={busy}
        nextLabel="Work it out"
        onBack={previous ? () => void moveTo(previous) : undefined}
        onNext={() => void (missing.length === 0 ? workOut() : moveTo(`${missing[0]}-extended`))}
      />
    </Screen>
  );
}
