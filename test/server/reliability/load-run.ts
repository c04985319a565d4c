/**
 * autocannon 9 with a sequence of requests per connection, which the declaration the benchmarks
 * share (test/bench/autocannon.d.ts) leaves out; typed here for the load test.
 */
import autocannon from 'autocannon';

export interface SequencedRequest {
  method?: 'GET' | 'POST';
  path: string;
  headers?: Record<string, string>;
  body?: string;
  /** Answers the request to send, changed as need be. */
  setupRequest?: (request: SequencedRequest) => SequencedRequest;
  onResponse?: (status: number) => void;
}

export interface LoadOptions {
  url: string;
  connections: number;
  /** Seconds. */
  duration: number;
  /** Seconds a request may go unanswered before it counts as a timeout. */
  timeout: number;
  requests: SequencedRequest[];
}

export interface LoadResult {
  /** Seconds the run took. */
  duration: number;
  latency: { p50: number; p99: number; max: number };
  errors: number;
  timeouts: number;
  non2xx: number;
}

type Autocannon = (options: LoadOptions, done: (error: Error | null, result: LoadResult) => void) => {
  on(event: 'response', listener: (client: unknown, statusCode: number) => void): void;
};

/** Runs the load; answers autocannon's result and the count of answers per HTTP status. */
export function runLoad(options: LoadOptions): Promise<{ result: LoadResult; statuses: Map<number, number> }> {
  const statuses = new Map<number, number>();
  return new Promise((resolve, reject) => {
    const run = (autocannon as unknown as Autocannon)(options, (error, result) => (error ? reject(error) : resolve({ result, statuses })));
    run.on('response', (_client, status) => statuses.set(status, (statuses.get(status) ?? 0) + 1));
  });
}
