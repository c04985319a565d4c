import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { shopDataKeys } from '@/api/keys';
import type { AuditPage } from '@shared/types/shop-data';

/** One page of the audit of shop data edits, newest first; the page in view stays while the next loads. */
export function useAudit(entity: string | undefined, page: number) {
  return useSWR<AuditPage, ApiError>(shopDataKeys.audit(entity, page), (path: string) => api.get<AuditPage>(path), {
    keepPreviousData: true,
  });
}
