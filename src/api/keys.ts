/**
 * SWR cache keys, all in one place so a mutation can revalidate exactly what it changed.
 * A key is the API path it is fetched from, so the fetcher needs nothing else.
 */
import type { UserSearchInput } from '@shared/schemas/auth.schema';

const USERS_PATH = '/users';

export const keys = {
  health: '/health',
  /** One page of one search of the admin's user list. */
  users: ({ q, page, pageSize }: UserSearchInput) =>
    `${USERS_PATH}?${new URLSearchParams({ q, page: String(page), pageSize: String(pageSize) })}`,
  /** Every page of every search: what a change to an account makes stale. */
  isUsers: (key: unknown) => typeof key === 'string' && key.startsWith(`${USERS_PATH}?`),
  outbox: '/dev/outbox',
  outboxMail: (id: string) => `/dev/outbox/${encodeURIComponent(id)}`,
} as const;
