import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { LoadCasesAnswer, LoadCaseSwitchInput } from '@shared/types/load-case';
import type { SetupLogEntry } from '@shared/types/setup-log';

export function useLoadCases(bikeId: number) {
  return useSWR<LoadCasesAnswer, ApiError>(riderKeys.loadCases(bikeId), (path: string) => api.get<LoadCasesAnswer>(path));
}

/** Sets the bike for a load case (null: solo); the cases, the bike and its log refresh. */
export function useLoadCaseSwitch(bikeId: number) {
  const { mutate } = useSWRConfig();
  return async (name: string | null): Promise<SetupLogEntry> => {
    const input: LoadCaseSwitchInput = { name };
    const { entry } = await api.post<{ entry: SetupLogEntry }>(riderKeys.loadCase(bikeId), input);
    await Promise.all([
      mutate(riderKeys.loadCases(bikeId)),
      mutate(riderKeys.setupLog(bikeId)),
      mutate(riderKeys.backToBaseline(bikeId)),
      mutate(riderKeys.bike(bikeId)),
      mutate(riderKeys.bikes),
    ]);
    return entry;
  };
}
