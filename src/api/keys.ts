/**
 * SWR cache keys, all in one place so a mutation can revalidate exactly what it changed.
 * A key is the API path it is fetched from, so the fetcher needs nothing else.
 */
export const keys = {
  health: '/health',
} as const;
