/**
 * A customer's bike on the shop's bench: the desk takes the three lengths of each end, the
 * engine sizes them with the customer's weigh-in, and the saved result can become a quote at once.
 */
import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { ShopReadingsForm } from '@/components/quotes/shop-readings-form';
import { EndResultCard } from '@/components/result/end-result-card';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useCustomerBikes, useCustomerWeighIn } from '@/hooks/use-customers';
import { useMakeQuote } from '@/hooks/use-make-quote';
import { useUnits } from '@/hooks/use-units';
import { useLayout, useTheme } from '@/theme';
import { endsOf } from '@shared/garage/build-sizing-request';
import type { SizingRecord } from '@shared/types/garage';

export default function ShopReadingsScreen() {
  const params = useLocalSearchParams<{ id: string; bikeId: string; name?: string }>();
  const riderId = Number(params.id);
  const bikeId = Number(params.bikeId);
  const bikes = useCustomerBikes(riderId);
  const weighIn = useCustomerWeighIn(riderId);
  const { units } = useUnits();
  const [record, setRecord] = useState<SizingRecord | null>(null);
  const customerHref = { pathname: '/desk/customers/[id]', params: { id: String(riderId), ...(params.name && { name: params.name }) } } as const;
  const bike = bikes.data?.bikes.find((candidate) => candidate.id === bikeId);
  const error = bikes.error ?? weighIn.error;

  let body;
  if (error) {
    body = <ErrorState title="The bike could not be loaded" message={error.message} onRetry={() => void Promise.all([bikes.mutate(), weighIn.mutate()])} />;
  } else if (!bikes.data || !weighIn.data) {
    body = <LoadingState label="Loading the bike…" />;
  } else if (!bike) {
    body = <ErrorState title="This bike is not in the customer's garage" message="Open the customer again and choose the bike from there." />;
  } else if (record) {
    body = <SavedResult record={record} onAgain={() => setRecord(null)} />;
  } else if (!weighIn.data.weighIn) {
    body = (
      <Card tone="warning" testID="readings-no-weigh-in">
        <ThemedText>The sizing needs the customer&apos;s weights: weigh them in on the customer page first.</ThemedText>
        <TextLink href={customerHref}>To the weigh-in</TextLink>
      </Card>
    );
  } else {
    const travelMm = { front: bike.front?.travelMm, rear: bike.rear?.wheelTravelMm };
    body = (
      <>
        <ThemedText color="textMuted">
          Sized with the weigh-in saved on the customer page. Lengths in {units.length}; between the same two marks every time.
        </ThemedText>
        <ShopReadingsForm
          ends={endsOf(bike)}
          travelMm={travelMm}
          units={units}
          onSave={async (readings) => setRecord(await bikes.sizeFromReadings(bike.id, readings))}
        />
      </>
    );
  }

  return (
    <Screen width="table">
      <TextLink href={customerHref}>{`← ${params.name ?? 'Customer'}`}</TextLink>
      <ThemedText type="title">{bike ? `Readings: ${bike.nickname}` : 'Readings'}</ThemedText>
      {bike?.model && <ThemedText color="textMuted">{bike.model.name}</ThemedText>}
      {body}
    </Screen>
  );
}

/** The engine's answer for each end measured, and the way on to a quote. */
function SavedResult({ record, onAgain }: { record: SizingRecord; onAgain: () => void }) {
  const { spacing } = useTheme();
  const { isWide } = useLayout();
  const { making, problem, makeQuote } = useMakeQuote(record.id);
  const ends = [record.result.front, record.result.rear].filter((end) => end !== undefined);
  return (
    <>
      <Card tone="success" testID="readings-saved">
        <ThemedText role="status">Result saved for the customer ({record.profileLabel}).</ThemedText>
        {problem && (
          <ThemedText role="alert" color="danger">
            {problem}
          </ThemedText>
        )}
        <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
          <Button label={making ? 'Making…' : 'Make a quote'} disabled={making} onPress={() => void makeQuote()} testID="readings-make-quote" />
          <Button label="Take new readings" variant="secondary" disabled={making} onPress={onAgain} />
        </View>
      </Card>
      <View style={{ flexDirection: isWide ? 'row' : 'column', gap: spacing.xl, alignItems: 'flex-start' }}>
        {ends.map((end) => (
          <View key={end.end} style={{ flex: isWide ? 1 : undefined, width: isWide ? undefined : '100%' }}>
            <EndResultCard result={end} />
          </View>
        ))}
      </View>
    </>
  );
}
