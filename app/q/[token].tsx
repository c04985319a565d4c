/**
 * The customer's quote, opened from the mailed link. It sits outside the signed-in area: the
 * link's token is all the customer needs to read the quote, answer it and pay the deposit.
 */
import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/api/client';
import { formatMoney } from '@/components/catalogue/money';
import { DepositPayment, PaymentReceipt } from '@/components/quotes/deposit-payment';
import { QuoteLines } from '@/components/quotes/quote-lines';
import { formatDate, formatDateTime } from '@/components/quotes/quote-status';
import { QuoteTotals } from '@/components/quotes/quote-totals';
import { StatusBadge } from '@/components/quotes/status-badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useCustomerQuote } from '@/hooks/use-customer-quote';
import { useTheme } from '@/theme';

export default function CustomerQuoteScreen() {
  const { token } = useLocalSearchParams<{ token: string }>();
  const { data, error, isLoading, mutate, accept, decline, payDeposit } = useCustomerQuote(token);
  const { spacing } = useTheme();
  const [answering, setAnswering] = useState(false);
  const [answerError, setAnswerError] = useState<string | null>(null);

  if (isLoading) {
    return (
      <Screen>
        <LoadingState label="Loading your quote…" />
      </Screen>
    );
  }
  if (error || !data) {
    const dead = error instanceof ApiError && error.status === 404;
    return (
      <Screen>
        <ThemedText type="title">Your quote</ThemedText>
        <ErrorState
          title={dead ? 'This link no longer works' : 'The quote could not be loaded'}
          message={dead ? 'Ask the shop to send the quote again.' : (error?.message ?? '')}
          {...(!dead && { onRetry: () => void mutate() })}
        />
      </Screen>
    );
  }

  const { quote } = data;
  async function answer(request: () => Promise<unknown>) {
    setAnswering(true);
    setAnswerError(null);
    try {
      await request();
    } catch (cause) {
      setAnswerError(cause instanceof Error ? cause.message : 'That did not go through.');
    } finally {
      setAnswering(false);
    }
  }

  return (
    <Screen>
      <View style={{ gap: spacing.xs }}>
        <ThemedText type="overline" color="textMuted">
          {quote.shop.name}
        </ThemedText>
        <ThemedText type="title">Quote {quote.number}</ThemedText>
        <StatusBadge status={quote.status} />
      </View>
      <ThemedText>
        For {quote.rider.name}
        {quote.bikeName ? `, ${quote.bikeName}` : ''}. Valid until {formatDate(quote.validUntil)}.
      </ThemedText>
      {quote.fittingAt && (
        <Card tone="success" testID="fitting-time">
          <ThemedText type="bodyStrong">Fitting booked</ThemedText>
          <ThemedText>{formatDateTime(quote.fittingAt)}</ThemedText>
        </Card>
      )}

      <Card>
        <ThemedText type="heading">What the quote covers</ThemedText>
        <QuoteLines lines={quote.lines} currency={quote.currency} />
        <QuoteTotals quote={quote} />
        <ThemedText type="caption" color="textMuted">
          {quote.roundingRule}
        </ThemedText>
      </Card>

      {quote.status === 'sent' && (
        <Card testID="quote-answer">
          <ThemedText type="heading">Your answer</ThemedText>
          <ThemedText>Accept the quote to pay the deposit and have the shop book your fitting.</ThemedText>
          {answerError && (
            <ThemedText role="alert" color="danger">
              {answerError}
            </ThemedText>
          )}
          <View style={[styles.row, { gap: spacing.md }]}>
            <Button label="Accept the quote" disabled={answering} onPress={() => void answer(accept)} />
            <Button
              label="Decline"
              variant="secondary"
              disabled={answering}
              onPress={() => void answer(() => decline())}
            />
          </View>
        </Card>
      )}
      {quote.status === 'accepted' && quote.depositDueCents > 0 && (
        <DepositPayment amountCents={quote.depositDueCents} currency={quote.currency} onPay={payDeposit} />
      )}
      {quote.status === 'springs-released' && (
        <Card tone="warning" testID="springs-released">
          <ThemedText type="bodyStrong">The springs for this quote are no longer held</ThemedText>
          <ThemedText>
            {`The shop had to release springs it was holding for you, so the work cannot go ahead as quoted. The shop will contact you${
              quote.paidCents > quote.refundedCents
                ? `; your deposit of ${formatMoney(quote.paidCents - quote.refundedCents, quote.currency)} is refunded in full when the quote is closed.`
                : '.'
            }`}
          </ThemedText>
        </Card>
      )}
      {quote.status === 'declined' && (
        <Card>
          <ThemedText>You declined this quote. Contact the shop if you change your mind.</ThemedText>
        </Card>
      )}
      {quote.receipt && <PaymentReceipt receipt={quote.receipt} currency={quote.currency} />}

      <SafetyNotice title="Before the work" />
      {quote.cautions ? <ThemedText color="textMuted">{quote.cautions}</ThemedText> : null}

      <Card>
        <ThemedText type="heading">{quote.shop.name}</ThemedText>
        <ThemedText>{quote.shop.address}</ThemedText>
        <ThemedText>{quote.shop.phone}</ThemedText>
        <ThemedText>{quote.shop.email}</ThemedText>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap' },
});
