import type { Href } from 'expo-router';

import type { MeasuringStep } from '@shared/types/garage';

/** The screen of a measuring step. */
export function stepHref(bikeId: number, step: MeasuringStep): Href {
  return `/rider/measure/${bikeId}/${step}` as Href;
}
