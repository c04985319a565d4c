import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { counterKeys } from '@/api/keys';
import type { RatesForFit, SpringKind } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

export type FitQuestion = { kind: SpringKind; family: string; rate: number; unit: RateUnit };

/** The nearest rates in stock for a fit; nothing is asked until the question is complete. */
export function useRatesForFit(question: FitQuestion | undefined, limit = 5) {
  const query = question
    ? new URLSearchParams({
        kind: question.kind,
        family: question.family,
        rate: String(question.rate),
        unit: question.unit,
        inStock: 'true',
        limit: String(limit),
      }).toString()
    : null;
  return useSWR<RatesForFit, ApiError>(query ? counterKeys.ratesForFit(query) : null, (path: string) =>
    api.get<RatesForFit>(path),
  );
}
