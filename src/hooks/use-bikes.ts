import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { BikeSpec } from '@shared/types/bike';
import type { GarageBike } from '@shared/types/garage';

type BikesAnswer = { bikes: GarageBike[] };
type BikeAnswer = { bike: GarageBike };

export type BikeCreateInput = { modelId?: number; nickname: string } & Partial<BikeSpec>;
export type BikeUpdateInput = BikeSpec & { nickname: string };

/** The rider's garage, oldest bike first. */
export function useBikes() {
  return useSWR<BikesAnswer, ApiError>(riderKeys.bikes, (path: string) => api.get<BikesAnswer>(path));
}

export function useBike(id: number | undefined) {
  return useSWR<BikeAnswer, ApiError>(id ? riderKeys.bike(id) : null, (path: string) => api.get<BikeAnswer>(path));
}

/** Adding, correcting and removing bikes; each refreshes the garage list once it lands. */
export function useBikeChanges() {
  const { mutate } = useSWRConfig();
  async function refresh(bike?: GarageBike) {
    await mutate(riderKeys.bikes);
    if (bike) await mutate(riderKeys.bike(bike.id), { bike }, { revalidate: false });
  }
  return {
    create: async (input: BikeCreateInput) => {
      const { bike } = await api.post<BikeAnswer>(riderKeys.bikes, input);
      await refresh(bike);
      return bike;
    },
    update: async (id: number, input: BikeUpdateInput) => {
      const { bike } = await api.put<BikeAnswer>(riderKeys.bike(id), input);
      await refresh(bike);
      return bike;
    },
    remove: async (id: number) => {
      await api.delete(riderKeys.bike(id));
      await refresh();
    },
  };
}
