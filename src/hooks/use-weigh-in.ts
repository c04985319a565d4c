import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { WeighIn, WeighInAnswer } from '@shared/types/garage';

/** The rider's weigh-in as kept on the profile, with its totals. */
export function useWeighIn() {
  const swr = useSWR<WeighInAnswer, ApiError>(riderKeys.weighIn, (path: string) => api.get<WeighInAnswer>(path));
  async function save(weighIn: WeighIn) {
    const answer = await api.put<WeighInAnswer>(riderKeys.weighIn, weighIn);
    await swr.mutate(answer, { revalidate: false });
    return answer;
  }
  return { ...swr, save };
}
