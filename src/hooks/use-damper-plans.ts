import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys, testRideKeys } from '@/api/keys';
import type { DamperPlanApplyInput } from '@shared/schemas/damping.schema';
import type { DamperPlanApplied, DamperPlans, DamperPlanTarget } from '@shared/types/test-ride';

/** Per end, the turns back to the maker's standard and back to the baseline. */
export function useDamperPlans(bikeId: number | undefined) {
  return useSWR<DamperPlans, ApiError>(bikeId ? testRideKeys.damperPlans(bikeId) : null, (path: string) => api.get<DamperPlans>(path));
}

/**
 * What a damping adjuster moved on the bike makes stale: the bike (in the garage and on the desk's
 * customer page), its setup log and way back to baseline, the plans and the rides, whose undo
 * plans count from where the adjuster is now.
 */
export function useDamperChangeRefresh(bikeId: number) {
  const { mutate } = useSWRConfig();
  return async () => {
    await Promise.all([
      mutate(testRideKeys.rides(bikeId)),
      mutate(testRideKeys.damperPlans(bikeId)),
      mutate(riderKeys.setupLog(bikeId)),
      mutate(riderKeys.backToBaseline(bikeId)),
      mutate(riderKeys.bike(bikeId)),
      mutate(riderKeys.bikes),
      mutate(testRideKeys.isCustomerBikes),
    ]);
  };
}

/** Follows one end's plan on the bike: one setup-log entry, and everything it moved refreshes. */
export function useApplyDamperPlan(bikeId: number) {
  const refresh = useDamperChangeRefresh(bikeId);
  return async (target: DamperPlanTarget, end: DamperPlanApplyInput['end']): Promise<DamperPlanApplied> => {
    const input: DamperPlanApplyInput = { end };
    const answer = await api.post<DamperPlanApplied>(testRideKeys.applyDamperPlan(bikeId, target), input);
    await refresh();
    return answer;
  };
}
