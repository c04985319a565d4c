import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { deskKeys } from '@/api/keys';
import type { GarageBike } from '@shared/types/garage';
import type { CustomerSummary } from '@shared/types/quote';

type CustomerPage = { customers: CustomerSummary[]; total: number; page: number; pageSize: number };
type BikesAnswer = { bikes: GarageBike[] };

/** Riders whose name or e-mail matches; the last answer stays while the next search loads. */
export function useCustomers(q: string, page = 1) {
  return useSWR<CustomerPage, ApiError>(deskKeys.customers(q, page), (path: string) => api.get<CustomerPage>(path), {
    keepPreviousData: true,
  });
}

/** One customer's garage, as the desk may read it. */
export function useCustomerBikes(riderId: number) {
  return useSWR<BikesAnswer, ApiError>(deskKeys.riderBikes(riderId), (path: string) => api.get<BikesAnswer>(path));
}
