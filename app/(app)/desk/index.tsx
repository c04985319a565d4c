import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { CLOSED_STATUSES, QuoteCard, QuoteColumns, StatusFilter } from '@/components/quotes/quote-board';
import { STATUS_LABELS } from '@/components/quotes/quote-status';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useQuotes } from '@/hooks/use-quotes';
import { useLayout, useTheme } from '@/theme';
import type { QuoteStatus } from '@shared/types/quote';

/**
 * The desk's quotes by status: one column per open status on a wide screen; on a phone a status
 * to pick and the list of it, since six columns do not fit a hand.
 */
export default function QuoteBoardScreen() {
  const { isWide } = useLayout();
  const { spacing } = useTheme();
  const [status, setStatus] = useState<QuoteStatus>('draft');
  const { data, error, isLoading, mutate, isValidating } = useQuotes();

  const quotes = data?.quotes ?? [];
  const closed = quotes.filter((quote) => CLOSED_STATUSES.includes(quote.status));
  const shown = quotes.filter((quote) => quote.status === status);
  return (
    <Screen width="table">
      <View style={[styles.header, { gap: spacing.md }]}>
        <ThemedText type="title">Quotes</ThemedText>
        <Link href="/desk/customers" asChild>
          <Button label="Find a customer" variant="secondary" />
        </Link>
      </View>
      <ThemedText color="textMuted">
        A quote starts from a customer&apos;s sizing record: find the rider under Customers.
      </ThemedText>
      {isLoading ? (
        <LoadingState label="Loading quotes…" />
      ) : error ? (
        <ErrorState
          title="The quotes could not be loaded"
          message={error.message}
          onRetry={() => void mutate()}
          retrying={isValidating}
        />
      ) : isWide ? (
        <>
          <QuoteColumns quotes={quotes} />
          {closed.length > 0 && (
            <View style={{ gap: spacing.sm }}>
              <ThemedText type="heading">Closed</ThemedText>
              <View style={[styles.closed, { gap: spacing.sm }]}>
                {closed.map((quote) => (
                  <View key={quote.id} style={[styles.closedCard, { gap: spacing.xxs }]}>
                    <ThemedText type="caption" color="textMuted">
                      {STATUS_LABELS[quote.status]}
                    </ThemedText>
                    <QuoteCard quote={quote} />
                  </View>
                ))}
              </View>
            </View>
          )}
        </>
      ) : (
        <>
          <StatusFilter value={status} onChange={setStatus} quotes={quotes} />
          {shown.length === 0 ? (
            <EmptyState title={`No quotes are ${STATUS_LABELS[status].toLowerCase()}.`} />
          ) : (
            <View role="list" style={{ gap: spacing.sm }}>
              {shown.map((quote) => (
                <QuoteCard key={quote.id} quote={quote} />
              ))}
            </View>
          )}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between' },
  // As wide as a board column, so a closed quote reads like the open ones.
  closed: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start' },
  closedCard: { width: 200 },
});
