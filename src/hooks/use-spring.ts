import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { counterKeys } from '@/api/keys';
import type { CountInput, OverrideReleaseInput, ReceiveInput, ReleaseInput, ReserveInput, SpringUpdateInput } from '@shared/schemas/catalogue.schema';
import type { SpringAnswer, StockAnswer, StockHoldList } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

export const MOVEMENTS_PAGE_SIZE = 10;

function detailQuery(unit: RateUnit, page: number) {
  return new URLSearchParams({ unit, page: String(page), pageSize: String(MOVEMENTS_PAGE_SIZE) }).toString();
}

/** One spring with a page of its stock history. */
export function useSpring(id: number, unit: RateUnit, page: number) {
  return useSWR<SpringAnswer, ApiError>(
    Number.isInteger(id) && id > 0 ? counterKeys.spring(id, detailQuery(unit, page)) : null,
    (path: string) => api.get<SpringAnswer>(path),
    { keepPreviousData: true },
  );
}

/** Who holds the spring's reserved units, oldest hold first. */
export function useSpringHolds(id: number) {
  return useSWR<StockHoldList, ApiError>(Number.isInteger(id) && id > 0 ? counterKeys.holds(id) : null, (path: string) => api.get<StockHoldList>(path));
}

/** Stock moves and edits; each revalidates every catalogue answer, since lists show stock too, and the spring's holds. */
export function useSpringChanges(id: number) {
  const { mutate } = useSWRConfig();
  async function after<T>(answer: T): Promise<T> {
    await Promise.all([mutate(counterKeys.isCatalogue), mutate(counterKeys.holds(id))]);
    return answer;
  }
  return {
    receive: async (input: ReceiveInput) => after(await api.post<StockAnswer>(`/stock/${id}/receive`, input)),
    count: async (input: CountInput) => after(await api.post<StockAnswer>(`/stock/${id}/count`, input)),
    hold: async (input: ReserveInput) => after(await api.post<StockAnswer>(`/stock/${id}/reserve`, input)),
    release: async (input: ReleaseInput) => after(await api.post<StockAnswer>(`/stock/${id}/release`, input)),
    overrideRelease: async (input: OverrideReleaseInput) => after(await api.post<StockAnswer>(`/stock/${id}/override-release`, input)),
    update: async (input: SpringUpdateInput) => after(await api.patch<SpringAnswer>(`/catalogue/springs/${id}`, input)),
    setActive: async (active: boolean) =>
      after(await api.post<SpringAnswer>(`/catalogue/springs/${id}/${active ? 'reactivate' : 'deactivate'}`)),
  };
}
