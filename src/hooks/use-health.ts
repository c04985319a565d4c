import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { keys } from '@/api/keys';
import type { Health } from '@shared/types/health';

/** The server's health; `mutate` re-asks at once (the retry button). */
export function useHealth() {
  return useSWR<Health, ApiError>(keys.health, (path: string) => api.get<Health>(path));
}
