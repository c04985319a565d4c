import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import type { MovementPage } from '@shared/types/catalogue';

/** One page of the stock ledger for one set of filters (a query from buildMovementQuery). */
export function useStockMovements(query: string) {
  return useSWR<MovementPage, ApiError>(`/stock/movements?${query}`, (path: string) => api.get<MovementPage>(path), {
    keepPreviousData: true,
  });
}
