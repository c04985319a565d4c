import { useLocalSearchParams } from 'expo-router';
import { Platform, View } from 'react-native';

import { useDecisionText } from '@/components/result/decision-view';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SAFETY_CAUTIONS } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { useQuantityFormat } from '@/components/units/quantity-format';
import { useBike } from '@/hooks/use-bikes';
import { useSizingRecord } from '@/hooks/use-sizing-records';
import { describeLoadCase, nameSpring } from '@shared/sizing/decision-text';
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

/** One end on paper: the decision's headline and steps, as on the result screen, and the sags with their windows. */
function EndSheet({ result }: { result: EndResult }) {
  const text = useDecisionText(result);
  const format = useQuantityFormat();
  const id = `sheet-${result.end}`;
  return (
    <View style={{ gap: 2 }} testID={id}>
      <ThemedText type="heading">{result.end === 'front' ? 'Front' : 'Rear'}</ThemedText>
      <ThemedText type="bodyStrong" testID={`${id}-headline`}>
        {text.headline}
      </ThemedText>
      {text.steps.map((step, i) => (
        <ThemedText key={step}>
          {i + 1}. {step}
        </ThemedText>
      ))}
      <Line label={`Static sag (window ${format.length(result.target.staticSagMm.min)} to ${format.length(result.target.staticSagMm.max)})`}>
        <Quantity value={result.staticSagMm} kind="length" />
      </Line>
      <Line label={`Rider sag (window ${format.length(result.target.riderSagMm.min)} to ${format.length(result.target.riderSagMm.max)})`}>
        <Quantity value={result.riderSagMm} kind="length" />
      </Line>
      <Line label="Spring fitted">
        <ThemedText type="figure">{nameSpring(result.installedSpring, format)}</ThemedText>
      </Line>
      {result.decision.kind !== 'check' &&
        result.loadCases.map((loadCase) => <ThemedText key={loadCase.name}>{describeLoadCase(loadCase, format)}</ThemedText>)}
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
        {bike.data?.bike.nickname ?? 'Bike'} · {record.profileLabel} · {new Date(record.createdAt).toLocaleDateString()} · engine {record.engineVersion}
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
