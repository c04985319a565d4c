import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import type { BikeModel, BikeSpec } from '@shared/types/bike';

type ModelsAnswer = { models: BikeModel[] };
type ModelAnswer = { model: BikeModel };

export type BikeModelInput = BikeSpec & { name: string; description?: string };

/** The shop's stored bike models, by name. */
export function useBikeModels() {
  return useSWR<ModelsAnswer, ApiError>(riderKeys.bikeModels, (path: string) => api.get<ModelsAnswer>(path));
}

export function useBikeModel(id: number | undefined) {
  return useSWR<ModelAnswer, ApiError>(id ? riderKeys.bikeModel(id) : null, (path: string) =>
    api.get<ModelAnswer>(path),
  );
}

/** The admin's edits to the model catalogue. */
export function useBikeModelChanges() {
  const { mutate } = useSWRConfig();
  async function after(model?: BikeModel) {
    await mutate(riderKeys.bikeModels);
    if (model) await mutate(riderKeys.bikeModel(model.id), { model }, { revalidate: false });
    return model;
  }
  return {
    create: async (input: BikeModelInput) => after((await api.post<ModelAnswer>(riderKeys.bikeModels, input)).model),
    update: async (id: number, input: BikeModelInput) =>
      after((await api.put<ModelAnswer>(riderKeys.bikeModel(id), input)).model),
    remove: async (id: number) => {
      await api.delete(riderKeys.bikeModel(id));
      await after();
    },
  };
}
