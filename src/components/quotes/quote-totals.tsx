import { StyleSheet, View } from 'react-native';

import { formatMoney } from '@/components/catalogue/money';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { QuoteView } from '@shared/types/quote';

type Totals = Pick<
  QuoteView,
  | 'currency'
  | 'partsCents'
  | 'labourCents'
  | 'subtotalCents'
  | 'taxCents'
  | 'totalCents'
  | 'taxBasisPoints'
  | 'depositDueCents'
  | 'paidCents'
  | 'refundedCents'
  | 'balanceDueCents'
>;

/** Basis points as a percentage with no float: 2100 → "21", 2050 → "20.5". */
function percentOf(basisPoints: number): string {
  const whole = Math.trunc(basisPoints / 100);
  const rest = basisPoints % 100;
  return rest === 0 ? String(whole) : `${whole}.${String(rest).padStart(2, '0').replace(/0$/, '')}`;
}

/** The server's sums as it computed them; the client never adds money up itself. */
export function QuoteTotals({ quote }: { quote: Totals }) {
  const { spacing, colors } = useTheme();
  const money = (cents: number) => formatMoney(cents, quote.currency);
  const rows: { label: string; cents: number; id: string; strong?: boolean }[] = [
    { label: 'Parts', cents: quote.partsCents, id: 'parts' },
    { label: 'Labour', cents: quote.labourCents, id: 'labour' },
    { label: 'Subtotal', cents: quote.subtotalCents, id: 'subtotal' },
    { label: `Tax (${percentOf(quote.taxBasisPoints)}%)`, cents: quote.taxCents, id: 'tax' },
    { label: 'Total', cents: quote.totalCents, id: 'total', strong: true },
    { label: 'Deposit due', cents: quote.depositDueCents, id: 'deposit' },
  ];
  if (quote.paidCents > 0) rows.push({ label: 'Paid', cents: quote.paidCents, id: 'paid' });
  if (quote.refundedCents > 0) rows.push({ label: 'Refunded', cents: quote.refundedCents, id: 'refunded' });
  if (quote.paidCents > 0) {
    rows.push({ label: 'Balance due at fitting', cents: quote.balanceDueCents, id: 'balance', strong: true });
  }
  return (
    <View testID="quote-totals" style={{ gap: spacing.xs }}>
      {rows.map((row) => (
        <View
          key={row.id}
          style={[
            styles.row,
            row.id === 'total' && { borderTopWidth: 1, borderTopColor: colors.border, paddingTop: spacing.xs },
          ]}
        >
          <ThemedText type={row.strong ? 'bodyStrong' : 'body'}>{row.label}</ThemedText>
          <ThemedText type="figure" testID={`total-${row.id}`}>
            {money(row.cents)}
          </ThemedText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: 12 },
});
