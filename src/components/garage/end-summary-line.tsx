import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { formatNumber } from '@shared/sizing/format';
import type { EndSummary } from '@shared/types/garage';
import type { DecisionKind, EndKind, Verdict } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const DECISION_WORDS: Record<DecisionKind, string> = {
  keep: 'keep the spring',
  marginal: 'spring works, marginal',
  change: 'change needed',
  check: 'check before acting',
  none: 'no advice',
};

/** Passes made before decisions carry only the verdict on the spring. */
const VERDICT_WORDS: Record<Verdict, string> = {
  keep: 'spring suits',
  'too-soft': 'spring too soft',
  'too-stiff': 'spring too stiff',
  'preload-out-of-range': 'preload out of range',
};

/** "Rear: rider sag 34.0 mm (30 %), keep the spring". */
export function EndSummaryLine({ end, summary, testID }: { end: EndKind; summary: EndSummary; testID?: string }) {
  const { spacing } = useTheme();
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.xs }} testID={testID}>
      <ThemedText type="label">{end === 'front' ? 'Front' : 'Rear'}: rider sag</ThemedText>
      <Quantity value={summary.riderSagMm} kind="length" />
      {summary.riderSagPct !== null && <ThemedText type="figure">({formatNumber(summary.riderSagPct, 0)} %)</ThemedText>}
      {summary.decision ? (
        <ThemedText color="textMuted">, {DECISION_WORDS[summary.decision]}</ThemedText>
      ) : (
        summary.verdict && <ThemedText color="textMuted">, {VERDICT_WORDS[summary.verdict]}</ThemedText>
      )}
    </View>
  );
}
