import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { Input } from '@/components/ui/input';
import { LoadingState } from '@/components/ui/loading-state';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useFamilies } from '@/hooks/use-families';
import { useRatesForFit, type FitQuestion } from '@/hooks/use-rates-for-fit';
import { useTheme } from '@/theme';
import type { SpringKind } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

import { ChipChoice } from './chip-choice';
import { RateMatches } from './rate-matches';
import { formatRate } from './rate-text';
import { parseRate } from './spring-query';

/** The answer to one fit question: loading, failed, or the nearest rates. */
export function FitAnswer({ question }: { question: FitQuestion }) {
  const { data, error, isValidating, mutate } = useRatesForFit(question);
  if (error && !data) return <ErrorState title="The rates could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />;
  if (!data) return <LoadingState label="Looking for rates…" />;
  return (
    <>
      <ThemedText color="textMuted">{`Nearest to ${formatRate(data.targetInUnit, data.unit)} in ${data.kind} · ${data.family}:`}</ThemedText>
      <RateMatches matches={data.matches} unit={data.unit} />
    </>
  );
}

/** Kind, family and a target rate in the person's unit → the nearest rates in stock. */
export function FitRates({ unit }: { unit: RateUnit }) {
  const { spacing } = useTheme();
  const families = useFamilies();
  const [kind, setKind] = useState<SpringKind>('fork');
  const [family, setFamily] = useState<string>();
  const [rateText, setRateText] = useState('');
  const [question, setQuestion] = useState<FitQuestion>();
  const [problem, setProblem] = useState<string>();

  if (families.error && !families.data) {
    return <ErrorState title="The fits could not be loaded" message={families.error.message} onRetry={() => void families.mutate()} />;
  }
  if (!families.data) return <LoadingState label="Loading the fits…" />;
  const fits = families.data.families.filter((f) => f.kind === kind);

  const ask = () => {
    const rate = parseRate(rateText);
    if (!family) return setProblem('Pick the family (the fit) to look in.');
    if (!rate) return setProblem(`Give the target rate in ${unit}, above 0.`);
    setProblem(undefined);
    setQuestion({ kind, family, rate, unit });
  };

  return (
    <View style={{ gap: spacing.md }}>
      <SegmentedChoice
        label="Kind"
        options={[
          { value: 'fork', label: 'Fork' },
          { value: 'shock', label: 'Shock' },
        ]}
        value={kind}
        onChange={(next) => {
          setKind(next);
          setFamily(undefined);
        }}
      />
      {fits.length ? (
        <ChipChoice label="Family" options={fits.map((f) => ({ value: f.family, label: `${f.family} (${f.available})` }))} value={family} onChange={setFamily} />
      ) : (
        <ThemedText color="textMuted">{`The catalogue has no ${kind} springs yet.`}</ThemedText>
      )}
      <View style={[styles.row, { gap: spacing.sm }]}>
        <Input
          accessibilityLabel={`Target rate, ${unit}`}
          placeholder={`Target rate, ${unit}`}
          value={rateText}
          onChangeText={setRateText}
          onSubmitEditing={ask}
          inputMode="decimal"
          invalid={Boolean(problem)}
          style={styles.rate}
        />
        <Button label="Find rates" onPress={ask} />
      </View>
      {problem && (
        <ThemedText role="alert" color="danger">
          {problem}
        </ThemedText>
      )}
      {question && <FitAnswer question={question} />}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
  rate: { width: 200 },
});
