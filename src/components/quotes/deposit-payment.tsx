import { useState } from 'react';
import { View } from 'react-native';

import { ApiError } from '@/api/client';
import { formatMoney } from '@/components/catalogue/money';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { ReceiptView } from '@shared/types/quote';

/**
 * The shop runs its card payments in test mode: instead of card details the customer picks one of
 * the test cards, each standing for a payment method the payment service knows.
 */
const TEST_CARDS = [
  { value: 'pm_card_visa', label: 'A card that pays' },
  { value: 'pm_card_chargeDeclined', label: 'A card that is declined' },
] as const;

type TestCard = (typeof TEST_CARDS)[number]['value'];

export type DepositPaymentProps = {
  amountCents: number;
  currency: string;
  onPay: (paymentMethod: string) => Promise<unknown>;
};

/** The deposit by card. A declined card leaves the form as it was, with the reason. */
export function DepositPayment({ amountCents, currency, onPay }: DepositPaymentProps) {
  const { spacing } = useTheme();
  const [card, setCard] = useState<TestCard>('pm_card_visa');
  const [paying, setPaying] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function pay() {
    setPaying(true);
    setError(null);
    try {
      await onPay(card);
    } catch (cause) {
      setError(
        cause instanceof ApiError && cause.status === 402
          ? 'The card was declined. No money was taken; try another card.'
          : cause instanceof Error
            ? cause.message
            : 'The payment did not go through.',
      );
    } finally {
      setPaying(false);
    }
  }

  return (
    <Card testID="deposit-payment">
      <ThemedText type="heading">Pay the deposit by card</ThemedText>
      <ThemedText>
        A deposit of {formatMoney(amountCents, currency)} holds the parts and a fitting slot for you. The rest is
        paid at fitting.
      </ThemedText>
      <View style={{ gap: spacing.xs }}>
        <ThemedText type="label">Test card</ThemedText>
        <ThemedText type="caption" color="textMuted">
          Card payments are in test mode: no real card is charged.
        </ThemedText>
        <SegmentedChoice label="Test card" options={TEST_CARDS} value={card} onChange={setCard} disabled={paying} />
      </View>
      {error && (
        <Card tone="danger">
          <ThemedText role="alert">{error}</ThemedText>
        </Card>
      )}
      <Button
        label={paying ? 'Paying…' : `Pay ${formatMoney(amountCents, currency)}`}
        disabled={paying}
        onPress={() => void pay()}
      />
    </Card>
  );
}

/** What was paid, when and with which card. */
export function PaymentReceipt({ receipt, currency }: { receipt: ReceiptView; currency: string }) {
  return (
    <Card tone="success" testID="payment-receipt">
      <ThemedText type="heading">Receipt</ThemedText>
      <ThemedText>
        Deposit paid: <ThemedText type="figure">{formatMoney(receipt.amountCents, currency)}</ThemedText>
      </ThemedText>
      <ThemedText>Paid on {new Date(receipt.paidAt).toLocaleString()}</ThemedText>
      <ThemedText>
        Card payment{receipt.last4 ? ` with the card ending ${receipt.last4}` : ''}
      </ThemedText>
      <ThemedText type="caption" color="textMuted">
        Reference {receipt.intentId}
      </ThemedText>
    </Card>
  );
}
