/**
 * One quote at the desk: its lines while a draft (every change saved at once, totals as the
 * server answers), then the actions its status allows, and the history of its status.
 */
import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { formatMoney } from '@/components/catalogue/money';
import { FittingPicker } from '@/components/quotes/fitting-picker';
import { LineEditor } from '@/components/quotes/line-editor';
import { QuoteHistory } from '@/components/quotes/quote-history';
import { QuoteLines } from '@/components/quotes/quote-lines';
import { formatDate, formatDateTime } from '@/components/quotes/quote-status';
import { QuoteTotals } from '@/components/quotes/quote-totals';
import { StatusBadge } from '@/components/quotes/status-badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useQuote, useQuoteChanges, useSpringOptions } from '@/hooks/use-quote';
import { useShopSettings } from '@/hooks/use-shop-settings';
import { useLayout, useTheme } from '@/theme';
import type { QuoteStatus, QuoteView } from '@shared/types/quote';

const REVISABLE: readonly QuoteStatus[] = ['sent', 'declined', 'expired'];
const CANCELLABLE: readonly QuoteStatus[] = ['draft', 'sent', 'accepted', 'deposit-paid', 'booked', 'springs-released'];

export default function QuoteEditorScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const { data, error, isLoading, mutate } = useQuote(id);
  const { isWide } = useLayout();
  const { spacing } = useTheme();
  const draft = data?.quote.status === 'draft';
  const options = useSpringOptions(id, draft);
  const settings = useShopSettings();
  const changes = useQuoteChanges(id);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);

  if (isLoading) {
    return (
      <Screen width="table">
        <LoadingState label="Loading the quote…" />
      </Screen>
    );
  }
  if (error || !data) {
    return (
      <Screen width="table">
        <ErrorState title="The quote could not be loaded" message={error?.message ?? ''} onRetry={() => void mutate()} />
      </Screen>
    );
  }
  const { quote } = data;

  async function run(action: () => Promise<QuoteView>, done?: (quote: QuoteView) => string | null) {
    setBusy(true);
    setProblem(null);
    setNotice(null);
    try {
      const next = await action();
      setNotice(done?.(next) ?? null);
      if (next.id !== quote.id) router.replace(`/desk/quotes/${next.id}`);
    } catch (cause) {
      setProblem(cause instanceof Error ? cause.message : 'That did not go through.');
      // A refused line change may mean the stock moved: show the shelf as it is now.
      if (draft) void options.mutate();
    } finally {
      setBusy(false);
    }
  }

  const lines = draft ? (
    <LineEditor
      quote={quote}
      options={options.data}
      operations={settings.data?.settings.operations ?? []}
      saving={busy}
      onSave={(next) => void run(() => changes.saveLines(next))}
    />
  ) : (
    <QuoteLines lines={quote.lines} currency={quote.currency} />
  );

  return (
    <Screen width="table">
      <TextLink href="/desk">← All quotes</TextLink>
      <View style={{ gap: spacing.xs }}>
        <ThemedText type="title">
          Quote {quote.number}
          {quote.version > 1 ? ` (version ${quote.version})` : ''}
        </ThemedText>
        <StatusBadge status={quote.status} />
        <ThemedText>
          {quote.rider.name} · {quote.rider.email}
          {quote.bikeName ? ` · ${quote.bikeName}` : ''}
        </ThemedText>
        <ThemedText type="caption" color="textMuted">
          Valid until {formatDate(quote.validUntil)}
          {quote.sentAt ? ` · sent ${formatDateTime(quote.sentAt)}` : ''}
        </ThemedText>
        <TextLink href={`/desk/quotes/${quote.id}/print`}>Print view</TextLink>
      </View>
      {problem && (
        <Card tone="danger">
          <ThemedText role="alert">{problem}</ThemedText>
        </Card>
      )}
      {notice && (
        <Card tone="success">
          <ThemedText role="status">{notice}</ThemedText>
        </Card>
      )}
      <View style={[isWide && styles.split, { gap: spacing.xl }]}>
        <Card style={isWide && styles.main}>
          <ThemedText type="heading">Lines</ThemedText>
          {lines}
        </Card>
        <View style={[isWide && styles.side, { gap: spacing.lg }]}>
          <Card>
            <ThemedText type="heading">Totals</ThemedText>
            <QuoteTotals quote={quote} />
          </Card>
          <Actions quote={quote} busy={busy} run={run} changes={changes} />
          <Card>
            <ThemedText type="heading">History</ThemedText>
            <QuoteHistory history={quote.history} />
          </Card>
        </View>
      </View>
    </Screen>
  );
}

type ActionsProps = {
  quote: QuoteView;
  busy: boolean;
  run: (action: () => Promise<QuoteView>, done?: (quote: QuoteView) => string | null) => Promise<void>;
  changes: ReturnType<typeof useQuoteChanges>;
};

/** The next steps the status allows, and nothing else. */
function Actions({ quote, busy, run, changes }: ActionsProps) {
  const { spacing } = useTheme();
  const [fittingAt, setFittingAt] = useState<string | null>(quote.fittingAt);
  const bookable =
    quote.status === 'deposit-paid' ||
    quote.status === 'booked' ||
    (quote.status === 'accepted' && quote.depositDueCents === 0);
  const moved = fittingAt !== null && fittingAt !== quote.fittingAt;

  function book() {
    if (!fittingAt) return;
    void run(() => changes.book(fittingAt), (next) => `Fitting booked for ${formatDateTime(next.fittingAt!)}.`);
  }

  return (
    <Card testID="quote-actions">
      <ThemedText type="heading">Next step</ThemedText>
      {quote.status === 'draft' && (
        <Button
          label="Send to the customer"
          disabled={busy || quote.lines.length === 0}
          onPress={() => void run(changes.send, () => `Sent to ${quote.rider.email}.`)}
        />
      )}
      {quote.status === 'sent' && <ThemedText>Waiting for the customer to accept or decline.</ThemedText>}
      {quote.status === 'accepted' && quote.depositDueCents > 0 && (
        <ThemedText>Accepted: waiting for the deposit of {formatMoney(quote.depositDueCents, quote.currency)}.</ThemedText>
      )}
      {bookable && (
        <View style={{ gap: spacing.sm }}>
          <ThemedText type="label">{quote.status === 'booked' ? 'Another day or time' : 'Fitting day and time'}</ThemedText>
          <FittingPicker value={fittingAt} onChange={setFittingAt} disabled={busy} />
          <ThemedText testID="fitting-choice">
            {fittingAt ? `Chosen: ${formatDateTime(fittingAt)}` : 'Choose a day, then a time.'}
          </ThemedText>
          <Button
            label={quote.status === 'booked' ? 'Move the fitting' : 'Book the fitting'}
            disabled={busy || !moved}
            onPress={book}
            testID="book-fitting"
          />
        </View>
      )}
      {quote.status === 'booked' && (
        <View style={{ gap: spacing.sm }}>
          <ThemedText>Fitting {formatDateTime(quote.fittingAt!)}.</ThemedText>
          <Button
            label="Mark as fitted"
            disabled={busy}
            onPress={() =>
              void run(changes.markFitted, (next) => `Fitted. Balance due: ${formatMoney(next.balanceDueCents, next.currency)}.`)
            }
          />
        </View>
      )}
      {quote.status === 'springs-released' && (
        <ThemedText testID="springs-released-note">
          {`The parts counter released springs this quote held (the history says which and why), so it cannot be fitted as quoted. Cancel it${
            quote.paidCents > quote.refundedCents
              ? ` to refund the deposit of ${formatMoney(quote.paidCents - quote.refundedCents, quote.currency)}`
              : ''
          }, then quote again if the customer still wants the work.`}
        </ThemedText>
      )}
      {quote.status === 'fitted' && (
        <ThemedText testID="balance-due">
          Fitted. Balance due: {formatMoney(quote.balanceDueCents, quote.currency)}
        </ThemedText>
      )}
      {quote.status === 'cancelled' && (
        <ThemedText testID="closed-note">
          {quote.refundedCents > 0
            ? `Cancelled. The deposit of ${formatMoney(quote.refundedCents, quote.currency)} went back to the customer's card.`
            : 'Cancelled. Nothing is reserved for it any more.'}
        </ThemedText>
      )}
      {quote.status === 'declined' && <ThemedText testID="closed-note">The customer declined. Revise it to offer another version.</ThemedText>}
      {quote.status === 'expired' && <ThemedText testID="closed-note">Expired unanswered. Revise it to send it again.</ThemedText>}
      {quote.status === 'superseded' && <ThemedText testID="closed-note">Replaced by a newer version.</ThemedText>}
      {REVISABLE.includes(quote.status) && (
        <Button variant="secondary" label="Revise (new version)" disabled={busy} onPress={() => void run(changes.revise)} />
      )}
      {CANCELLABLE.includes(quote.status) && (
        <Button
          variant="secondary"
          label="Cancel the quote"
          disabled={busy}
          onPress={() =>
            void run(
              () => changes.cancel(),
              (next) => (next.refundedCents > 0 ? `Cancelled; ${formatMoney(next.refundedCents, next.currency)} refunded.` : 'Cancelled.'),
            )
          }
        />
      )}
      {quote.supersededById && <TextLink href={`/desk/quotes/${quote.supersededById}`}>Open the newer version</TextLink>}
    </Card>
  );
}

const styles = StyleSheet.create({
  split: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { flex: 3 },
  side: { flex: 2 },
});
