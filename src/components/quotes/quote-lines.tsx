import { StyleSheet, View } from 'react-native';

import { formatMoney } from '@/components/catalogue/money';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { QuoteLineView } from '@shared/types/quote';

const END_LABELS = { front: 'Fork', rear: 'Shock' } as const;

/** What the quote is for, line by line, as the server priced it. */
export function QuoteLines({ lines, currency }: { lines: QuoteLineView[]; currency: string }) {
  const { spacing, colors } = useTheme();
  return (
    <View role="list" style={{ gap: spacing.sm }}>
      {lines.map((line) => (
        <View
          key={line.id}
          role="listitem"
          testID={`quote-line-${line.id}`}
          style={[styles.row, { gap: spacing.md, borderBottomWidth: 1, borderBottomColor: colors.border, paddingBottom: spacing.sm }]}
        >
          <View style={styles.text}>
            <ThemedText>{line.description}</ThemedText>
            <ThemedText type="caption" color="textMuted">
              {line.kind === 'spring'
                ? `${line.end ? `${END_LABELS[line.end]} · ` : ''}${line.quantity} × ${formatMoney(line.unitPriceCents, currency)}`
                : `${line.quantity} × ${line.minutes ?? 0} min`}
            </ThemedText>
          </View>
          <ThemedText type="figure">{formatMoney(line.lineCents, currency)}</ThemedText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start' },
  text: { flex: 1 },
});
