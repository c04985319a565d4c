import { Link, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { WeighInForm } from '@/components/garage/weigh-in-form';
import { AddBikeForm } from '@/components/quotes/add-bike-form';
import { BikeDampingSection } from '@/components/quotes/bike-damping-section';
import { formatDateTime } from '@/components/quotes/quote-status';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { formatQuantity } from '@/components/units/format';
import { useBikeModels } from '@/hooks/use-bike-models';
import { useCustomerBikes, useCustomerWeighIn } from '@/hooks/use-customers';
import { useMakeQuote } from '@/hooks/use-make-quote';
import { useBikeRecords } from '@/hooks/use-sizing-records';
import { useTargetProfiles } from '@/hooks/use-target-profiles';
import { useUnits } from '@/hooks/use-units';
import { useTheme } from '@/theme';
import type { DisplayUnits, GarageBike, SizingRecordSummary } from '@shared/types/garage';

/**
 * One customer's bikes and the sizing records saved for each: where a quote starts; and each
 * bike's dampers, test rides and setup log, where the desk runs the test-ride loop with the
 * customer at the counter. For a walk-in the desk adds the bike from a shop model and weighs them
 * in; a bike not in yet is sized from the weights, one on the bench from the readings the desk
 * takes.
 */
export default function CustomerScreen() {
  const params = useLocalSearchParams<{ id: string; name?: string }>();
  const riderId = Number(params.id);
  const { data, error, isLoading, mutate, addBike, sizeFromWeights } = useCustomerBikes(riderId);
  return (
    <Screen>
      <TextLink href="/desk/customers">← Customers</TextLink>
      <ThemedText type="title">{params.name ?? 'Customer'}</ThemedText>
      {isLoading ? (
        <LoadingState label="Loading the bikes…" />
      ) : error || !data ? (
        <ErrorState title="The bikes could not be loaded" message={error?.message ?? ''} onRetry={() => void mutate()} />
      ) : data.bikes.length === 0 ? (
        <EmptyState title="No bikes yet.">Add one from a shop model below, or the rider adds one in their garage.</EmptyState>
      ) : (
        data.bikes.map((bike) => (
          <BikeRecords key={bike.id} bike={bike} riderId={riderId} customerName={params.name} sizeFromWeights={sizeFromWeights} />
        ))
      )}
      <AddBike addBike={addBike} />
      <CustomerWeighIn riderId={riderId} />
    </Screen>
  );
}

function AddBike({ addBike }: { addBike: (modelId: number, nickname: string) => Promise<unknown> }) {
  const models = useBikeModels();
  return (
    <Card testID="add-bike">
      <ThemedText type="heading">Add a bike from a shop model</ThemedText>
      {models.error ? (
        <ErrorState title="The shop models could not be loaded" message={models.error.message} onRetry={() => void models.mutate()} />
      ) : !models.data ? (
        <LoadingState label="Loading the shop models…" />
      ) : (
        <AddBikeForm models={models.data.models} onAdd={addBike} />
      )}
    </Card>
  );
}

/** The weights the sizing uses; a saved sizing record keeps the weigh-in it was worked from. */
function CustomerWeighIn({ riderId }: { riderId: number }) {
  const weighIn = useCustomerWeighIn(riderId);
  const profiles = useTargetProfiles();
  const [saved, setSaved] = useState(false);
  const error = weighIn.error ?? profiles.error;
  return (
    <Card testID="customer-weigh-in">
      <ThemedText type="heading">Weigh-in</ThemedText>
      {error ? (
        <ErrorState title="The weigh-in could not be loaded" message={error.message} onRetry={() => void Promise.all([weighIn.mutate(), profiles.mutate()])} />
      ) : !weighIn.data || !profiles.data ? (
        <LoadingState label="Loading the weigh-in…" />
      ) : (
        <WeighInForm
          weighIn={weighIn.data.weighIn}
          profiles={profiles.data.profiles}
          submitLabel="Save the weigh-in"
          onSubmit={async (value) => {
            setSaved(false);
            await weighIn.save(value);
            setSaved(true);
          }}
        />
      )}
      {saved && <ThemedText role="status">Weigh-in saved.</ThemedText>}
    </Card>
  );
}

type BikeRecordsProps = {
  bike: GarageBike;
  riderId: number;
  customerName: string | undefined;
  sizeFromWeights: (bikeId: number) => Promise<unknown>;
};

function BikeRecords({ bike, riderId, customerName, sizeFromWeights }: BikeRecordsProps) {
  const { spacing } = useTheme();
  const { data, error } = useBikeRecords(bike.id);
  const [sizing, setSizing] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  async function size() {
    setSizing(true);
    setProblem(null);
    try {
      await sizeFromWeights(bike.id);
    } catch (cause) {
      setProblem(cause instanceof Error ? cause.message : 'The bike could not be sized.');
    } finally {
      setSizing(false);
    }
  }
  return (
    <Card testID={`customer-bike-${bike.id}`}>
      <ThemedText type="heading">{bike.nickname}</ThemedText>
      {bike.model && <ThemedText color="textMuted">{bike.model.name}</ThemedText>}
      <View style={[styles.row, { gap: spacing.sm }]}>
        <Link
          href={{
            pathname: '/desk/customers/[id]/readings/[bikeId]',
            params: { id: String(riderId), bikeId: String(bike.id), ...(customerName && { name: customerName }) },
          }}
          asChild
        >
          <Button label="Size from readings" testID={`size-from-readings-${bike.id}`} />
        </Link>
        <Button
          label={sizing ? 'Sizing…' : 'Size from weights'}
          variant="secondary"
          disabled={sizing}
          onPress={() => void size()}
          testID={`size-from-weights-${bike.id}`}
        />
      </View>
      {problem && (
        <ThemedText role="alert" color="danger">
          {problem}
        </ThemedText>
      )}
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
      <BikeDampingSection bike={bike} />
    </Card>
  );
}

function describeEnd(label: string, end: SizingRecordSummary['front'], units: DisplayUnits): string | null {
  if (!end) return null;
  const rate = (nmm: number) => formatQuantity(nmm, 'rate', units);
  const best = end.bestRateNmm === null ? '' : `, best ${rate(end.bestRateNmm)}`;
  return `${label}: installed ${rate(end.installedRateNmm)}${best}`;
}

function RecordRow({ record }: { record: SizingRecordSummary }) {
  const { spacing } = useTheme();
  const { units } = useUnits();
  const { making, problem, makeQuote } = useMakeQuote(record.id);
  const ends = [describeEnd('Fork', record.front, units), describeEnd('Shock', record.rear, units)].filter(Boolean).join(' · ');
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
      <Button label={making ? 'Making…' : 'Make a quote'} disabled={making} onPress={() => void makeQuote()} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 180 },
});
