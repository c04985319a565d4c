import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { counterKeys } from '@/api/keys';
import type { SpringCreateInput } from '@shared/schemas/catalogue.schema';
import type { SpringAnswer, SpringPage } from '@shared/types/catalogue';

/** One page of one search of the catalogue; the previous page stays in view while the next loads. */
export function useSprings(query: string) {
  return useSWR<SpringPage, ApiError>(counterKeys.springs(query), (path: string) => api.get<SpringPage>(path), {
    keepPreviousData: true,
  });
}

/** Adds a spring by hand; every catalogue answer is stale once it exists. */
export function useCreateSpring() {
  const { mutate } = useSWRConfig();
  return async (input: SpringCreateInput) => {
    const answer = await api.post<SpringAnswer>('/catalogue/springs', input);
    await mutate(counterKeys.isCatalogue);
    return answer;
  };
}
