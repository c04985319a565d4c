import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { RiderSagChart } from '@/components/setup-log/rider-sag-chart';
import { describeChange } from '@/components/setup-log/change-text';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useBike } from '@/hooks/use-bikes';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useBikeRecords } from '@/hooks/use-sizing-records';
import { useBackToBaseline, useSetupLog } from '@/hooks/use-setup-log';
import { useUnits } from '@/hooks/use-units';
import { labelsOf } from '@shared/setup/damper-words';
import type { SetupLogEntry } from '@shared/types/setup-log';
import { useLayout, useTheme } from '@/theme';

function entryTitle(entry: SetupLogEntry): string {
  return entry.kind === 'pass' ? 'Measured' : 'Changed';
}

/** Every pass and change of one bike, oldest first, with the way back to the baseline. */
export default function SetupLogScreen() {
  const { spacing, colors } = useTheme();
  const { isWide } = useLayout();
  const { units } = useUnits();
  const bikeId = Number(useLocalSearchParams<{ bikeId: string }>().bikeId);
  const bike = useBike(bikeId);
  const log = useSetupLog(bikeId);
  const records = useBikeRecords(bikeId);
  // Until the list loads (or if it cannot), adjusters read as their keys.
  const labels = labelsOf(useDamperKinds().data?.kinds ?? []);
  const [showPlan, setShowPlan] = useState(false);
  const plan = useBackToBaseline(bikeId, showPlan);

  const error = log.error ?? records.error;
  const body = error ? (
    <ErrorState title="The setup log could not be loaded" message={error.message} onRetry={() => void Promise.all([log.mutate(), records.mutate()])} />
  ) : !log.data || !records.data ? (
    <LoadingState label="Loading the setup log…" />
  ) : log.data.entries.length === 0 ? (
    <EmptyState title="Nothing logged yet">Each pass you measure and each change you record shows here, with the settings before and after.</EmptyState>
  ) : null;

  const entries = log.data?.entries ?? [];
  const lines = (entry: SetupLogEntry) =>
    entry.kind === 'pass'
      ? [entry.sizing?.rear?.riderSagMm != null || entry.sizing?.front?.riderSagMm != null ? 'Sag measured' : 'Worked out from weights']
      : entry.changes.map((change) => describeChange(change, units, labels));

  return (
    <Screen width="table">
      <ThemedText type="title">Setup log</ThemedText>
      {bike.data && <ThemedText color="textMuted">{bike.data.bike.nickname}</ThemedText>}
      {body}
      {!body && (
        <>
          <RiderSagChart records={records.data!.records} />
          <View style={{ gap: spacing.sm }}>
            <Button label={showPlan ? 'Hide the way back' : 'Back to baseline'} variant="secondary" onPress={() => setShowPlan((shown) => !shown)} testID="back-to-baseline" />
            {showPlan &&
              (plan.error ? (
                <ErrorState title="The way back could not be worked out" message={plan.error.message} />
              ) : !plan.data ? (
                <LoadingState label="Working out the way back…" />
              ) : !plan.data.plan || plan.data.plan.atBaseline ? (
                <Card tone="success" testID="baseline-steps">
                  <ThemedText>The bike is at its baseline: nothing to undo.</ThemedText>
                </Card>
              ) : (
                <Card tone="warning" testID="baseline-steps">
                  <ThemedText type="bodyStrong">To get back to the baseline, in this order:</ThemedText>
                  {plan.data.plan.steps.map((step, index) => (
                    <ThemedText key={step} testID={`baseline-step-${index}`}>
                      {index + 1}. {step}
                    </ThemedText>
                  ))}
                  {plan.data.plan.notes.map((note) => (
                    <ThemedText key={note} color="textMuted">
                      {note}
                    </ThemedText>
                  ))}
                </Card>
              ))}
          </View>
          {isWide ? (
            <View role="table" testID="log-table" style={{ borderWidth: 1, borderColor: colors.border }}>
              <View role="row" style={{ flexDirection: 'row', backgroundColor: colors.surface, padding: spacing.sm }}>
                <ThemedText type="label" style={{ flex: 2 }}>When</ThemedText>
                <ThemedText type="label" style={{ flex: 1 }}>What</ThemedText>
                <ThemedText type="label" style={{ flex: 4 }}>Before → after</ThemedText>
                <ThemedText type="label" style={{ flex: 3 }}>Note</ThemedText>
              </View>
              {entries.map((entry, index) => (
                <View key={entry.id} role="row" testID={`log-entry-${entry.id}`} style={{ flexDirection: 'row', padding: spacing.sm, borderTopWidth: 1, borderColor: colors.border }}>
                  <ThemedText style={{ flex: 2 }}>
                    {new Date(entry.createdAt).toLocaleString()}
                    {index === 0 ? ' · baseline before' : ''}
                  </ThemedText>
                  <ThemedText style={{ flex: 1 }}>{entryTitle(entry)}</ThemedText>
                  <ThemedText style={{ flex: 4 }}>{lines(entry).join('\n')}</ThemedText>
                  <ThemedText style={{ flex: 3 }} color="textMuted">{entry.note}</ThemedText>
                </View>
              ))}
            </View>
          ) : (
            <View style={{ gap: spacing.md }}>
              {entries.map((entry, index) => (
                <Card key={entry.id} testID={`log-entry-${entry.id}`}>
                  {index === 0 && (
                    <ThemedText type="overline" color="success">
                      Baseline: the settings before this entry
                    </ThemedText>
                  )}
                  <ThemedText type="bodyStrong">
                    {entryTitle(entry)} · {new Date(entry.createdAt).toLocaleString()}
                  </ThemedText>
                  {lines(entry).map((line) => (
                    <ThemedText key={line}>{line}</ThemedText>
                  ))}
                  {entry.note ? <ThemedText color="textMuted">{entry.note}</ThemedText> : null}
                </Card>
              ))}
            </View>
          )}
        </>
      )}
    </Screen>
  );
}
