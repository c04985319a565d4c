import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { formatDateTime } from '@/components/quotes/quote-status';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useCustomerBikes } from '@/hooks/use-customers';
import { createQuote } from '@/hooks/use-quote';
import { useBikeRecords } from '@/hooks/use-sizing-records';
import { useTheme } from '@/theme';
import type { GarageBike, SizingRecordSummary } from '@shared/types/garage';

/** One customer's bikes and the sizing records saved for each: where a quote starts. */
export default function CustomerScreen() {
  const params = useLocalSearchParams<{ id: string; name?: string }>();
  const riderId = Number(params.id);
  const { data, error, isLoading, mutate } = useCustomerBikes(riderId);
  return (
    <Screen>
      <TextLink href="/desk/customers">← Customers</TextLink>
      <ThemedText type="title">{params.name ?? 'Customer'}</ThemedText>
      {isLoading ? (
        <LoadingState label="Loading the bikes…" />
      ) : error || !data ? (
        <ErrorState title="The bikes could not be loaded" message={error?.message ?? ''} onRetry={() => void mutate()} />
      ) : data.bikes.length === 0 ? (
        <EmptyState title="No bikes yet.">The rider adds a bike and measures it in their garage.</EmptyState>
      ) : (
        data.bikes.map((bike) => <BikeRecords key={bike.id} bike={bike} />)
      )}
    </Screen>
  );
}

function BikeRecords({ bike }: { bike: GarageBike }) {
  const { spacing } = useTheme();
  const { data, error } = useBikeRecords(bike.id);
  return (
    <Card testID={`customer-bike-${bike.id}`}>
      <ThemedText type="heading">{bike.nickname}</ThemedText>
      {bike.model && <ThemedText color="textMuted">{bike.model.name}</ThemedText>}
      {error ? (
        <ThemedText color="danger">{error.message}</ThemedText>
      ) : !data ? (
        <LoadingState label="Loading sizing records…" />
      ) : data.records.length === 0 ? (
        <ThemedText color="textMuted">No sizing records saved for this bike.</ThemedText>
      ) : (
        <View role="list" style={{ gap: spacing.md }}>
          {[...data.records].reverse().map((record) => (
            <RecordRow key={record.id} record={record} />
          ))}
        </View>
      )}
    </Card>
  );
}

function describeEnd(label: string, end: SizingRecordSummary['front']): string | null {
  if (!end) return null;
  const best = end.bestRateNmm === null ? '' : `, best ${end.bestRateNmm} N/mm`;
  return `${label}: installed ${end.installedRateNmm} N/mm${best}`;
}

function RecordRow({ record }: { record: SizingRecordSummary }) {
  const { spacing } = useTheme();
  const [making, setMaking] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  async function make() {
    setMaking(true);
    setProblem(null);
    try {
      const quote = await createQuote(record.id);
      router.push(`/desk/quotes/${quote.id}`);
    } catch (cause) {
      setProblem(cause instanceof Error ? cause.message : 'The quote could not be made.');
    } finally {
      setMaking(false);
    }
  }
  const ends = [describeEnd('Fork', record.front), describeEnd('Shock', record.rear)].filter(Boolean).join(' · ');
  return (
    <View role="listitem" style={[styles.row, { gap: spacing.md }]} testID={`sizing-record-${record.id}`}>
      <View style={styles.grow}>
        <ThemedText type="bodyStrong">
          {record.profileLabel} · {formatDateTime(record.createdAt)}
        </ThemedText>
        {ends ? <ThemedText type="caption" color="textMuted">{ends}</ThemedText> : null}
        {problem && (
          <ThemedText role="alert" color="danger">
            {problem}
          </ThemedText>
        )}
      </View>
      <Button label={making ? 'Making…' : 'Make a quote'} disabled={making} onPress={() => void make()} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 180 },
});
