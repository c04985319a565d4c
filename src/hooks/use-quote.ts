import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys } from '@/api/keys';
import type { QuoteView, SpringOption } from '@shared/types/quote';

type QuoteAnswer = { quote: QuoteView };
type SpringOptionsAnswer = { front: SpringOption[]; rear: SpringOption[] };

/** What the desk puts on a draft; the server prices every line itself. */
export type QuoteLineInput =
  | { kind: 'spring'; springId: number; end: 'front' | 'rear'; quantity: number }
  | { kind: 'labour'; operationCode: string; quantity: number };

export function useQuote(id: number) {
  return useSWR<QuoteAnswer, ApiError>(deskKeys.quote(id), (path: string) => api.get<QuoteAnswer>(path));
}

/** The springs that fit each end of the quoted bike, with what is on the shelf. */
export function useSpringOptions(id: number, enabled: boolean) {
  return useSWR<SpringOptionsAnswer, ApiError>(enabled ? deskKeys.springOptions(id) : null, (path: string) =>
    api.get<SpringOptionsAnswer>(path),
  );
}

/**
 * The desk's changes to one quote. Each puts the server's answer in the cache and marks every
 * board list stale, so totals and columns always show what the server decided.
 */
export function useQuoteChanges(id: number) {
  const { mutate } = useSWRConfig();
  const path = deskKeys.quote(id);
  async function land(request: Promise<QuoteAnswer>): Promise<QuoteView> {
    const { quote } = await request;
    await mutate(deskKeys.quote(quote.id), { quote }, { revalidate: false });
    if (quote.id !== id) await mutate(path);
    await mutate(deskKeys.isQuotes);
    return quote;
  }
  return {
    saveLines: (lines: QuoteLineInput[]) => land(api.put<QuoteAnswer>(`${path}/lines`, { lines })),
    send: () => land(api.post<QuoteAnswer>(`${path}/send`)),
    revise: () => land(api.post<QuoteAnswer>(`${path}/revise`)),
    book: (fittingAt: string) => land(api.post<QuoteAnswer>(`${path}/book`, { fittingAt })),
    markFitted: () => land(api.post<QuoteAnswer>(`${path}/fitted`)),
    cancel: (reason?: string) => land(api.post<QuoteAnswer>(`${path}/cancel`, reason ? { reason } : {})),
  };
}

/** Starts a draft from a saved sizing record: its recommended springs, swaps and sag set-up. */
export async function createQuote(sizingRecordId: number): Promise<QuoteView> {
  const { quote } = await api.post<QuoteAnswer>('/quotes', { sizingRecordId });
  return quote;
}
