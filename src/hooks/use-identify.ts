import { api } from '@/api/client';
import type { IdentifyInput } from '@shared/schemas/catalogue.schema';
import type { IdentifyAnswer } from '@shared/types/catalogue';

/** The rate of a measured spring, which the server works out, with the nearest catalogue rates. */
export function identifySpring(input: IdentifyInput) {
  return api.post<IdentifyAnswer>('/catalogue/identify', input);
}
