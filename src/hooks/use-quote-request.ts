import { api } from '@/api/client';
import type { QuoteView } from '@shared/types/quote';

export type QuoteRequestAnswer = { quote: QuoteView; created: boolean };

/** Sends a saved result to the service desk, which prepares a quote from it. */
export function requestQuote(recordId: number): Promise<QuoteRequestAnswer> {
  return api.post<QuoteRequestAnswer>(`/sizing-records/${recordId}/quote-request`);
}
