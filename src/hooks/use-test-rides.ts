import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { testRideKeys } from '@/api/keys';
import type { TestRideOutcomeInput, TestRideReportInput } from '@shared/schemas/damping.schema';
import type { TestRideChanged, TestRideJudged, TestRideList, TestRideReported } from '@shared/types/test-ride';

import { useDamperChangeRefresh } from './use-damper-plans';

/** Every test ride of a bike, newest first, and the one waiting to be made or judged. */
export function useTestRides(bikeId: number) {
  return useSWR<TestRideList, ApiError>(testRideKeys.rides(bikeId), (path: string) => api.get<TestRideList>(path));
}

/**
 * The loop's steps: report what the bike did, say the change is made, say how it rode, take a
 * worse change back. Each answer is the server's; after each the bike, its log, the plans and the
 * rides refresh, since any of them may have moved an adjuster or closed a proposal.
 */
export function useTestRideActions(bikeId: number) {
  const refresh = useDamperChangeRefresh(bikeId);
  async function after<T>(request: Promise<T>): Promise<T> {
    const answer = await request;
    await refresh();
    return answer;
  }
  return {
    report: (input: TestRideReportInput) => after(api.post<TestRideReported>(testRideKeys.rides(bikeId), input)),
    made: (rideId: number) => after(api.post<TestRideChanged>(testRideKeys.made(rideId))),
    outcome: (rideId: number, input: TestRideOutcomeInput) => after(api.post<TestRideJudged>(testRideKeys.outcome(rideId), input)),
    undo: (rideId: number) => after(api.post<TestRideChanged>(testRideKeys.undo(rideId))),
  };
}
