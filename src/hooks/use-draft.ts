import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { DraftAnswers, MeasuringDraft, MeasuringStep } from '@shared/types/garage';

type DraftAnswer = { draft: MeasuringDraft | null };

/** A bike's measuring draft: the step and the answers so far, kept on the server at every step. */
export function useDraft(bikeId: number) {
  const { mutate: mutateAny } = useSWRConfig();
  const swr = useSWR<DraftAnswer, ApiError>(riderKeys.draft(bikeId), (path: string) => api.get<DraftAnswer>(path), {
    // The flow holds the answers itself once loaded; a refetch must not overwrite what is typed.
    revalidateOnFocus: false,
    revalidateIfStale: false,
  });

  async function save(step: MeasuringStep, answers: DraftAnswers) {
    const answer = await api.put<DraftAnswer>(riderKeys.draft(bikeId), { step, answers });
    await swr.mutate(answer, { revalidate: false });
    await mutateAny(riderKeys.bikes);
    return answer.draft;
  }

  return { ...swr, save };
}

/**
 * Starts a fresh draft; `remeasure` carries the last pass's readings as hints. The cache takes the
 * new draft at once, so the flow opening next starts from it rather than from a stale "none".
 */
export function useStartDraft() {
  const { mutate } = useSWRConfig();
  return async (bikeId: number, remeasure: boolean): Promise<MeasuringDraft> => {
    const { draft } = await api.post<{ draft: MeasuringDraft }>(riderKeys.draft(bikeId), { remeasure });
    await mutate(riderKeys.draft(bikeId), { draft }, { revalidate: false });
    await mutate(riderKeys.bikes);
    return draft as MeasuringDraft;
  };
}
