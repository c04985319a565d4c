import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys, riderKeys } from '@/api/keys';
import type { GarageBike, SizingRecord, WeighIn, WeighInAnswer } from '@shared/types/garage';
import type { EndKind, Readings } from '@shared/types/sizing';
import type { CustomerSummary } from '@shared/types/quote';

type CustomerPage = { customers: CustomerSummary[]; total: number; page: number; pageSize: number };
type BikesAnswer = { bikes: GarageBike[] };

/** Riders whose name or e-mail matches; the last answer stays while the next search loads. */
export function useCustomers(q: string, page = 1) {
  return useSWR<CustomerPage, ApiError>(deskKeys.customers(q, page), (path: string) => api.get<CustomerPage>(path), {
    keepPreviousData: true,
  });
}

/** A rider who walked in: the account gets a random password and they reset it later. */
export async function createCustomer(input: { name: string; email: string }): Promise<CustomerSummary> {
  const { customer } = await api.post<{ customer: CustomerSummary }>('/customers', input);
  return customer;
}

/** One customer's garage, as the desk may read it, and the desk's additions to it. */
export function useCustomerBikes(riderId: number) {
  const { mutate } = useSWRConfig();
  const swr = useSWR<BikesAnswer, ApiError>(deskKeys.riderBikes(riderId), (path: string) => api.get<BikesAnswer>(path));
  async function addBike(modelId: number, nickname: string) {
    const { bike } = await api.post<{ bike: GarageBike }>(riderKeys.bikes, { riderId, modelId, nickname });
    await swr.mutate();
    return bike;
  }
  /** No readings given: the server sizes both ends from the customer's weigh-in and the model. */
  async function sizeFromWeights(bikeId: number) {
    const { record } = await api.post<{ record: SizingRecord }>(riderKeys.bikeRecords(bikeId), { ends: ['front', 'rear'] });
    await mutate(riderKeys.bikeRecords(bikeId));
    return record;
  }
  /** The bike is in the shop: the ends measured are sized from their readings and the weigh-in. */
  async function sizeFromReadings(bikeId: number, readings: Partial<Record<EndKind, Readings>>) {
    const ends = (['front', 'rear'] as const).filter((end) => readings[end] !== undefined);
    const { record } = await api.post<{ record: SizingRecord }>(riderKeys.bikeRecords(bikeId), { ends, readings });
    await Promise.all([mutate(riderKeys.bikeRecords(bikeId)), mutate(riderKeys.setupLog(bikeId)), swr.mutate()]);
    return record;
  }
  return { ...swr, addBike, sizeFromWeights, sizeFromReadings };
}

/** A customer's weigh-in as the desk reads and keeps it for them. */
export function useCustomerWeighIn(riderId: number) {
  const key = `${riderKeys.weighIn}?riderId=${riderId}`;
  const swr = useSWR<WeighInAnswer, ApiError>(key, (path: string) => api.get<WeighInAnswer>(path));
  async function save(weighIn: WeighIn) {
    const answer = await api.put<WeighInAnswer>(key, weighIn);
    await swr.mutate(answer, { revalidate: false });
    return answer;
  }
  return { ...swr, save };
}
