import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { counterKeys } from '@/api/keys';
import type { FamilySummary } from '@shared/types/catalogue';

type FamiliesAnswer = { families: FamilySummary[] };

/** The fits the catalogue holds springs for, with how many are available. */
export function useFamilies() {
  return useSWR<FamiliesAnswer, ApiError>(counterKeys.families, (path: string) => api.get<FamiliesAnswer>(path));
}
