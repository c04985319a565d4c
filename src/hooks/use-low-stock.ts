import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { counterKeys } from '@/api/keys';
import type { LowStockLine } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

type LowStockAnswer = { lines: LowStockLine[]; unit: RateUnit };

/** Springs whose availability fell below their reorder point, with what brings them back. */
export function useLowStock(unit: RateUnit) {
  return useSWR<LowStockAnswer, ApiError>(counterKeys.lowStock(new URLSearchParams({ unit }).toString()), (path: string) =>
    api.get<LowStockAnswer>(path),
  );
}
