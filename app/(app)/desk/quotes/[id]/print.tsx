import { useLocalSearchParams } from 'expo-router';
import { Platform } from 'react-native';

import { usePrintSheet } from '@/components/catalogue/use-print-sheet';
import { FittingDampersSection } from '@/components/quotes/fitting-dampers-section';
import { QuotePrint } from '@/components/quotes/quote-print';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { useQuote } from '@/hooks/use-quote';

/**
 * The quote on one clean page for the customer to take away, and for the fitting: how to set the
 * bike's damping adjusters afterwards. The print sheet hides the app's chrome.
 */
export default function QuotePrintScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const { data, error, mutate } = useQuote(Number(id));
  usePrintSheet();
  return (
    <Screen>
      <TextLink href={`/desk/quotes/${id}`}>← Back to the quote</TextLink>
      {error ? (
        <ErrorState title="The quote could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : !data ? (
        <LoadingState label="Loading the quote…" />
      ) : (
        <>
          {Platform.OS === 'web' && <Button label="Print" onPress={() => window.print()} testID="print-quote" />}
          <QuotePrint quote={data.quote} />
          {/* A quote whose bike was deleted since keeps no bike to set. */}
          {data.quote.bikeId !== null && <FittingDampersSection bikeId={data.quote.bikeId} />}
        </>
      )}
    </Screen>
  );
}
