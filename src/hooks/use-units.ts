import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { riderKeys } from '@/api/keys';
import { DEFAULT_UNITS, defaultRateUnit, toDisplayUnits } from '@shared/garage/units';
import type { DisplayUnits, UnitsPreference } from '@shared/types/garage';

type UnitsAnswer = { units: DisplayUnits };

const DEFAULT_DISPLAY_UNITS = toDisplayUnits(DEFAULT_UNITS);

/**
 * The signed-in person's units. Until the profile answers, figures show in the default (metric)
 * units rather than waiting, so a screen never holds back its numbers for the preference.
 */
export function useUnits() {
  const { data, error, mutate } = useSWR<UnitsAnswer, ApiError>(riderKeys.units, (path: string) =>
    api.get<UnitsAnswer>(path),
  );
  const units = data?.units ?? DEFAULT_DISPLAY_UNITS;

  /** A new system without a rate unit takes that system's usual one. */
  async function setUnits(preference: Partial<UnitsPreference>) {
    const system = preference.system ?? units.system;
    const next: UnitsPreference = { system, rateUnit: preference.rateUnit ?? (preference.system ? defaultRateUnit(system) : units.rateUnit) };
    // Shown at once; the server's answer (which fills the imperial rate default) replaces it.
    await mutate(api.put<UnitsAnswer>(riderKeys.units, next), {
      optimisticData: { units: toDisplayUnits(next) },
      rollbackOnError: true,
      revalidate: false,
    });
  }

  return { units, loaded: Boolean(data), error, setUnits };
}
