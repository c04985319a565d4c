import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys } from '@/api/keys';
import type { QuotePage, QuoteStatus } from '@shared/types/quote';

/** The most recent quotes, of one status or of all: the board shows what a desk works on at once. */
export function useQuotes(status: QuoteStatus | '' = '') {
  return useSWR<QuotePage, ApiError>(deskKeys.quotes(status), (path: string) => api.get<QuotePage>(path), {
    keepPreviousData: true,
  });
}
