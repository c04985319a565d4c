import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { TargetProfile } from '@shared/types/sizing';

type ProfilesAnswer = { profiles: TargetProfile[] };

/** The riding disciplines and their sag windows. */
export function useTargetProfiles() {
  const swr = useSWR<ProfilesAnswer, ApiError>(riderKeys.targetProfiles, (path: string) =>
    api.get<ProfilesAnswer>(path),
  );
  async function save(profile: TargetProfile) {
    const { discipline, label, note, front, rear } = profile;
    await api.put(`${riderKeys.targetProfiles}/${encodeURIComponent(discipline)}`, { label, note, front, rear });
    await swr.mutate();
  }
  return { ...swr, save };
}
