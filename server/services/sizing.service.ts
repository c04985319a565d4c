import { sizeBike } from '../../shared/sizing';
import type { SizingRequest, SizingResult, TargetProfile } from '../../shared/types/sizing';
import { ValidationError } from '../errors';
import { SizingDataCache } from './sizing-data.service';

/** A pass of the engine with the target profile it used, for whatever stores the pass. */
export interface SizingRun {
  result: SizingResult;
  profile: TargetProfile;
}

/** Runs the engine on a validated request with the shop's own profiles, settings and springs. */
export async function runSizingWithProfile(data: SizingDataCache, request: SizingRequest): Promise<SizingRun> {
  const [profiles, thresholds, front, rear] = await Promise.all([
    data.profileList(),
    data.warningThresholds(),
    request.front ? data.candidates('fork', request.front.family) : [],
    request.rear ? data.candidates('shock', request.rear.family) : [],
  ]);
  const profile = profiles.get(request.discipline);
  if (!profile) {
    const known = [...profiles.keys()].join(', ');
    throw new ValidationError({ discipline: `Unknown riding discipline "${request.discipline}": choose one of ${known}.` });
  }
  return { result: sizeBike(request, { profile, thresholds, springs: { front, rear } }), profile };
}

export async function runSizing(data: SizingDataCache, request: SizingRequest): Promise<SizingResult> {
  return (await runSizingWithProfile(data, request)).result;
}
