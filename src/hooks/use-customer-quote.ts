import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys } from '@/api/keys';
import type { QuoteView, ReceiptView } from '@shared/types/quote';

type QuoteAnswer = { quote: QuoteView };
type PaidAnswer = { quote: QuoteView; receipt: ReceiptView };

/**
 * The quote a mailed link names, read and answered with the link's token alone: the customer
 * need not sign in. Each answer replaces the cached quote with the server's.
 */
export function useCustomerQuote(token: string) {
  const key = deskKeys.customerQuote(token);
  const swr = useSWR<QuoteAnswer, ApiError>(key, (path: string) => api.get<QuoteAnswer>(path));
  const { mutate } = swr;
  async function act<T extends QuoteAnswer>(request: Promise<T>): Promise<T> {
    const answer = await request;
    await mutate({ quote: answer.quote }, { revalidate: false });
    return answer;
  }
  return {
    ...swr,
    accept: () => act(api.post<QuoteAnswer>(`${key}/accept`)),
    decline: (reason?: string) => act(api.post<QuoteAnswer>(`${key}/decline`, reason ? { reason } : {})),
    payDeposit: (paymentMethod: string) => act(api.post<PaidAnswer>(`${key}/pay-deposit`, { paymentMethod })),
  };
}
