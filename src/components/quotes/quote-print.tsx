import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { QuoteView } from '@shared/types/quote';

import { QuoteLines } from './quote-lines';
import { formatDate } from './quote-status';
import { QuoteTotals } from './quote-totals';

/**
 * A quote as it goes on paper: who quotes, for whom and which bike, the lines and the server's
 * totals, how long it holds and the shop's cautions. Nothing on it needs the screen to read.
 */
export function QuotePrint({ quote }: { quote: QuoteView }) {
  const { spacing } = useTheme();
  const { shop } = quote;
  return (
    <View testID="quote-print" style={{ gap: spacing.lg }}>
      <View testID="print-shop">
        <ThemedText type="heading">{shop.name}</ThemedText>
        <ThemedText>{shop.address}</ThemedText>
        <ThemedText>
          {shop.phone} · {shop.email}
        </ThemedText>
      </View>
      <View>
        <ThemedText type="title" testID="print-number">
          Quote {quote.number}, version {quote.version}
        </ThemedText>
        <ThemedText>Made {formatDate(quote.createdAt)}</ThemedText>
      </View>
      <View testID="print-customer">
        <ThemedText type="bodyStrong">For {quote.rider.name}</ThemedText>
        <ThemedText>{quote.rider.email}</ThemedText>
        {quote.bikeName && <ThemedText>Bike: {quote.bikeName}</ThemedText>}
      </View>
      <QuoteLines lines={quote.lines} currency={quote.currency} />
      <QuoteTotals quote={quote} />
      <ThemedText testID="print-validity">Valid until {formatDate(quote.validUntil)}.</ThemedText>
      {quote.cautions ? (
        <View testID="print-cautions">
          <ThemedText type="bodyStrong">Please note</ThemedText>
          <ThemedText>{quote.cautions}</ThemedText>
        </View>
      ) : null}
    </View>
  );
}
