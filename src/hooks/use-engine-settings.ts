import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { shopDataKeys } from '@/api/keys';
import type { EngineSettingRow } from '@shared/types/shop-data';

type SettingsAnswer = { settings: EngineSettingRow[] };

/** The engine's tunable values with their units, labels and sources. */
export function useEngineSettings() {
  const swr = useSWR<SettingsAnswer, ApiError>(shopDataKeys.engineSettings, (path: string) => api.get<SettingsAnswer>(path));
  async function save(values: Record<string, number>) {
    const answer = await api.patch<SettingsAnswer>(shopDataKeys.engineSettings, { values });
    await swr.mutate(answer, { revalidate: false });
  }
  return { ...swr, save };
}
