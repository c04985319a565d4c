import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { formatMoney } from '@/components/catalogue/money';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { QuoteStatus, QuoteSummary } from '@shared/types/quote';

import { STATUS_LABELS, formatDateTime } from './quote-status';

/** The statuses the desk still acts on, in the order work moves; closed ones follow. */
export const BOARD_COLUMNS: readonly QuoteStatus[] = ['draft', 'sent', 'accepted', 'deposit-paid', 'booked', 'springs-released', 'fitted'];
export const CLOSED_STATUSES: readonly QuoteStatus[] = ['declined', 'cancelled', 'expired', 'superseded'];

export function groupByStatus(quotes: QuoteSummary[]): Map<QuoteStatus, QuoteSummary[]> {
  const groups = new Map<QuoteStatus, QuoteSummary[]>();
  for (const quote of quotes) groups.set(quote.status, [...(groups.get(quote.status) ?? []), quote]);
  return groups;
}

/** One quote on the board, opening the editor. */
export function QuoteCard({ quote }: { quote: QuoteSummary }) {
  const { colors, radii, spacing } = useTheme();
  return (
    <Link href={`/desk/quotes/${quote.id}`} asChild>
      <Pressable
        accessibilityRole="link"
        testID={`quote-card-${quote.number}`}
        // A plain style: the link that wraps the card drops a style given as a function.
        style={{
          backgroundColor: colors.surface,
          borderColor: colors.border,
          borderWidth: 1,
          borderRadius: radii.md,
          padding: spacing.md,
          gap: spacing.xxs,
        }}
      >
        <ThemedText type="label">
          {quote.number}
          {quote.version > 1 ? ` v${quote.version}` : ''}
        </ThemedText>
        <ThemedText type="figure">{formatMoney(quote.totalCents, quote.currency)}</ThemedText>
        <ThemedText>{quote.rider.name}</ThemedText>
        {quote.bikeName && (
          <ThemedText type="caption" color="textMuted">
            {quote.bikeName}
          </ThemedText>
        )}
        {quote.fittingAt && <ThemedText type="caption">Fitting {formatDateTime(quote.fittingAt)}</ThemedText>}
      </Pressable>
    </Link>
  );
}

/** Side-by-side columns, one per open status, for a wide screen. */
export function QuoteColumns({ quotes }: { quotes: QuoteSummary[] }) {
  const { spacing } = useTheme();
  const groups = groupByStatus(quotes);
  return (
    <View style={[styles.columns, { gap: spacing.md }]}>
      {BOARD_COLUMNS.map((status) => (
        <View key={status} testID={`board-column-${status}`} style={[styles.column, { gap: spacing.sm }]}>
          <ThemedText type="label" accessibilityRole="header">
            {STATUS_LABELS[status]} ({groups.get(status)?.length ?? 0})
          </ThemedText>
          {(groups.get(status) ?? []).map((quote) => (
            <QuoteCard key={quote.id} quote={quote} />
          ))}
          {!groups.has(status) && (
            <ThemedText type="caption" color="textMuted">
              None
            </ThemedText>
          )}
        </View>
      ))}
    </View>
  );
}


/** The phone's status filter: every status as a chip with its count, wrapping over lines. */
export function StatusFilter({
  value,
  onChange,
  quotes,
}: {
  value: QuoteStatus;
  onChange: (status: QuoteStatus) => void;
  quotes: QuoteSummary[];
}) {
  const { colors, radii, sizes, spacing } = useTheme();
  const groups = groupByStatus(quotes);
  return (
    <View role="radiogroup" aria-label="Status" style={[styles.chips, { gap: spacing.sm }]}>
      {[...BOARD_COLUMNS, ...CLOSED_STATUSES].map((status) => {
        const selected = status === value;
        const label = `${STATUS_LABELS[status]} (${groups.get(status)?.length ?? 0})`;
        return (
          <Pressable
            key={status}
            role="radio"
            aria-checked={selected}
            aria-label={label}
            onPress={() => onChange(status)}
            style={{
              minHeight: sizes.touchTarget,
              justifyContent: 'center',
              paddingHorizontal: spacing.md,
              borderRadius: radii.pill,
              borderWidth: 2,
              borderColor: selected ? colors.text : colors.border,
              backgroundColor: selected ? colors.text : colors.surface,
            }}
          >
            <ThemedText type="label" color={selected ? 'surface' : 'text'} selectable={false}>
              {label}
            </ThemedText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0 },
  chips: { flexDirection: 'row', flexWrap: 'wrap' },
});
