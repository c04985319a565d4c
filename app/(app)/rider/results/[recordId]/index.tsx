import { useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';

import { EndResultCard } from '@/components/result/end-result-card';
import { ResultActions } from '@/components/result/result-actions';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useSizingRecord } from '@/hooks/use-sizing-records';
import { useLayout, useTheme } from '@/theme';

/** A saved pass: per end the decision, then the sags, preload and springs it rests on; front | rear on a wide screen. */
export default function ResultScreen() {
  const { spacing } = useTheme();
  const { isWide } = useLayout();
  const recordId = Number(useLocalSearchParams<{ recordId: string }>().recordId);
  const { data, error, mutate } = useSizingRecord(recordId);
  if (error) {
    return (
      <Screen>
        <ErrorState title="The result could not be loaded" message={error.message} onRetry={() => void mutate()} />
      </Screen>
    );
  }
  if (!data) {
    return (
      <Screen>
        <LoadingState label="Loading the result…" />
      </Screen>
    );
  }
  const { record } = data;
  const ends = [record.result.front, record.result.rear].filter((end) => end !== undefined);
  return (
    <Screen width="table">
      <ThemedText type="title">Result</ThemedText>
      <ThemedText color="textMuted">
        {record.profileLabel} · {new Date(record.createdAt).toLocaleString()} · engine {record.engineVersion}
      </ThemedText>
      <View style={{ flexDirection: isWide ? 'row' : 'column', gap: spacing.xl, alignItems: 'flex-start' }} testID="result-columns">
        {ends.map((end) => (
          <View key={end.end} style={{ flex: isWide ? 1 : undefined, width: isWide ? undefined : '100%' }}>
            <EndResultCard result={end} />
          </View>
        ))}
      </View>
      <ResultActions record={record} />
      <SafetyNotice />
    </Screen>
  );
}
