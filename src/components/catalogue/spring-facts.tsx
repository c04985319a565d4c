import { StyleSheet, View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import { formatNumber } from '@shared/sizing/format';
import type { SpringDetail } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

import { formatMoney } from './money';
import { rateText } from './spring-list';

const mm = (value: number | null) => (value === null ? '–' : `${formatNumber(value, 1)} mm`);

/** A spring's figures as label/value pairs that wrap into columns on a wide window. */
export function SpringFacts({ spring, unit }: { spring: SpringDetail; unit: RateUnit }) {
  const { spacing } = useTheme();
  const facts: [string, string][] = [
    ['Rate', rateText(spring, unit)],
    ['Break point', mm(spring.breakMm)],
    ['On hand', String(spring.onHand)],
    ['Reserved', String(spring.reserved)],
    ['Available', String(spring.available)],
    ['Reorder point', String(spring.reorderPoint)],
    ['Bin', spring.bin ?? '–'],
    ['Free length', mm(spring.freeLengthMm)],
    ['Max deflection', mm(spring.maxDeflectionMm)],
    ['Inner / outer diameter', `${mm(spring.innerDiameterMm)} / ${mm(spring.outerDiameterMm)}`],
    ['Wire diameter', mm(spring.wireDiameterMm)],
    ['Supplier', [spring.supplier, spring.supplierCode].filter(Boolean).join(' · ') || '–'],
    ['Cost', formatMoney(spring.costCents)],
    ['Sale price', formatMoney(spring.priceCents)],
  ];
  return (
    <View style={[styles.grid, { gap: spacing.md }]}>
      {facts.map(([label, value]) => (
        <View key={label} style={styles.fact}>
          <ThemedText type="caption" color="textMuted">
            {label}
          </ThemedText>
          <ThemedText type="figure" testID={`fact-${label}`}>
            {value}
          </ThemedText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap' },
  fact: { width: 170 },
});
