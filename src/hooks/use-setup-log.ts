import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { BackToBaseline, SetupChangeInput, SetupLog, SetupSettings } from '@shared/types/setup-log';

type BaselineAnswer = { baseline: SetupSettings | null; current: SetupSettings; plan: BackToBaseline | null };

export function useSetupLog(bikeId: number) {
  return useSWR<SetupLog, ApiError>(riderKeys.setupLog(bikeId), (path: string) => api.get<SetupLog>(path));
}

export function useBackToBaseline(bikeId: number, enabled: boolean) {
  return useSWR<BaselineAnswer, ApiError>(enabled ? riderKeys.backToBaseline(bikeId) : null, (path: string) =>
    api.get<BaselineAnswer>(path),
  );
}

/** Records a change made with a spanner; the bike, its log and the garage refresh. */
export function useSetupChange(bikeId: number) {
  const { mutate } = useSWRConfig();
  return async (input: SetupChangeInput) => {
    await api.post(riderKeys.setupLog(bikeId), input);
    await Promise.all([
      mutate(riderKeys.setupLog(bikeId)),
      mutate(riderKeys.backToBaseline(bikeId)),
      mutate(riderKeys.bike(bikeId)),
      mutate(riderKeys.bikes),
    ]);
  };
}
