import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys } from '@/api/keys';
import type { ShopSettingsInput } from '@shared/schemas/shop-settings.schema';
import type { ShopSettingsView } from '@shared/types/quote';

type SettingsAnswer = { settings: ShopSettingsView };

/** The shop's labour rate, tax, deposit and labour operations, as the desk quotes with them. */
export function useShopSettings() {
  const swr = useSWR<SettingsAnswer, ApiError>(deskKeys.shopSettings, (path: string) => api.get<SettingsAnswer>(path));
  /** Admin only; the answer replaces the cached settings. */
  async function save(settings: ShopSettingsInput) {
    const answer = await api.put<SettingsAnswer>(deskKeys.shopSettings, settings);
    await swr.mutate(answer, { revalidate: false });
  }
  return { ...swr, save };
}
