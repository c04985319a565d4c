import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { DamperKind } from '@shared/types/damping';

type KindsAnswer = { kinds: DamperKind[] };

/** The shop's list of damping adjuster kinds, the six of the trade first. */
export function useDamperKinds() {
  return useSWR<KindsAnswer, ApiError>(riderKeys.damperKinds, (path: string) => api.get<KindsAnswer>(path));
}

/** The admin adds a kind to the list; every screen that names adjusters reads the list again. */
export function useDamperKindCreate() {
  const { mutate } = useSWRConfig();
  return async (kind: DamperKind) => {
    const answer = await api.post<{ kind: DamperKind }>(riderKeys.damperKinds, kind);
    await mutate(riderKeys.damperKinds);
    return answer.kind;
  };
}
