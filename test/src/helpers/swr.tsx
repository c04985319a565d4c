import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';

/**
 * SWR for a component test: a cache of its own, no deduping, retries or slow-loading timer, so
 * each test sees only its own answers and leaves no timer running.
 */
export function TestSWR({ children }: { children: ReactNode }) {
  return (
    <SWRConfig
      value={{
        provider: () => new Map(),
        dedupingInterval: 0,
        shouldRetryOnError: false,
        loadingTimeout: 0,
        revalidateOnFocus: false,
        revalidateOnReconnect: false,
      }}
    >
      {children}
    </SWRConfig>
  );
}
