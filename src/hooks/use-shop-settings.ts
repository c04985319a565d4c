import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys } from '@/api/keys';
import type { ShopSettingsView } from '@shared/types/quote';

type SettingsAnswer = { settings: ShopSettingsView };

/** The shop's labour rate, tax, deposit and labour operations, as the desk quotes with them. */
export function useShopSettings() {
  return useSWR<SettingsAnswer, ApiError>(deskKeys.shopSettings, (path: string) => api.get<SettingsAnswer>(path));
}
