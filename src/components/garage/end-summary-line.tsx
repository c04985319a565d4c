import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { formatNumber } from '@shared/sizing/format';
import type { EndSummary } from '@shared/types/garage';
import type { EndKind, Verdict } from '@shared/types/sizing';
import { useTheme } from '@/theme';

export const VERDICT_LABELS: Record<Verdict, string> = {
  keep: 'spring suits',
  'too-soft': 'spring too soft',
  'too-stiff': 'spring too stiff',
  'preload-out-of-range': 'preload out of range',
};

/** "Rear: rider sag 34.0 mm (30 %), spring suits". */
export function EndSummaryLine({ end, summary, testID }: { end: EndKind; summary: EndSummary; testID?: string }) {
  const { spacing } = useTheme();
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.xs }} testID={testID}>
      <ThemedText type="label">{end === 'front' ? 'Front' : 'Rear'}: rider sag</ThemedText>
      <Quantity value={summary.riderSagMm} kind="length" />
      {summary.riderSagPct !== null && <ThemedText type="figure">({formatNumber(summary.riderSagPct, 0)} %)</ThemedText>}
      {summary.verdict && <ThemedText color="textMuted">, {VERDICT_LABELS[summary.verdict]}</ThemedText>}
    </View>
  );
}
