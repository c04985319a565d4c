import { useLocalSearchParams } from 'expo-router';
import { Platform, View } from 'react-native';

import { formatPreloadChange } from '@/components/result/preload-text';
import { preloadUnitsOf } from '@/components/result/end-result-card';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SAFETY_CAUTIONS } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { useBike } from '@/hooks/use-bikes';
import { useSizingRecord } from '@/hooks/use-sizing-records';
import type { EndResult } from '@shared/types/sizing';
import { useTheme } from '@/theme';

function Line({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <View style={{ flexDirection: 'row', justifyContent: 'space-between', borderBottomWidth: 1, borderColor: '#ccc', paddingVertical: 4 }}>
      <ThemedText>{label}</ThemedText>
      {children}
    </View>
  );
}

function EndSheet({ result }: { result: EndResult }) {
  const spring = result.recommendation.inStock ?? result.recommendation.best;
  return (
    <View style={{ gap: 2 }}>
      <ThemedText type="heading">{result.end === 'front' ? 'Front' : 'Rear'}</ThemedText>
      <ThemedText>{result.verdictText}</ThemedText>
      <Line label="Static sag">
        <Quantity value={result.staticSagMm} kind="length" />
      </Line>
      <Line label="Rider sag">
        <Quantity value={result.riderSagMm} kind="length" />
      </Line>
      {result.preload && (
        <Line label="Preload">
          <ThemedText type="bodyStrong">{formatPreloadChange(preloadUnitsOf(result), result.preload.unit)}</ThemedText>
        </Line>
      )}
      {result.preload && (
        <Line label="Rider sag after">
          <Quantity value={result.preload.riderSagAfterMm} kind="length" />
        </Line>
      )}
      <Line label="Spring fitted">
        <Quantity value={result.installedRateNmm} kind="rate" />
      </Line>
      {spring && (
        <Line label={`Recommended (${spring.sku})`}>
          <Quantity value={spring.rateNmm} kind="rate" />
        </Line>
      )}
    </View>
  );
}

/** One pass on one page, plain enough to print and take to the bike. */
export default function SetupSheetScreen() {
  const { spacing } = useTheme();
  const recordId = Number(useLocalSearchParams<{ recordId: string }>().recordId);
  const { data, error, mutate } = useSizingRecord(recordId);
  const bike = useBike(data?.record.bikeId ?? undefined);
  if (error) {
    return (
      <Screen>
        <ErrorState title="The setup sheet could not be loaded" message={error.message} onRetry={() => void mutate()} />
      </Screen>
    );
  }
  if (!data) {
    return (
      <Screen>
        <LoadingState label="Loading the setup sheet…" />
      </Screen>
    );
  }
  const { record } = data;
  return (
    <Screen>
      <ThemedText type="title">Setup sheet</ThemedText>
      <ThemedText>
        {bike.data?.bike.nickname ?? 'Bike'} · {record.profileLabel} · {new Date(record.createdAt).toLocaleDateString()}
      </ThemedText>
      {Platform.OS === 'web' && <Button label="Print" onPress={() => window.print()} testID="print-sheet" />}
      <View style={{ gap: spacing.lg }} testID="setup-sheet">
        {record.result.front && <EndSheet result={record.result.front} />}
        {record.result.rear && <EndSheet result={record.result.rear} />}
      </View>
      <View style={{ gap: 2 }}>
        {SAFETY_CAUTIONS.map((caution) => (
          <ThemedText key={caution} type="caption">
            · {caution}
          </ThemedText>
        ))}
      </View>
    </Screen>
  );
}
