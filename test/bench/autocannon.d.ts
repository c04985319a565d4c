/** The part of autocannon 9's API the benchmarks use (the package ships no types). */
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  interface Options {
    url: string;
    method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
    headers?: Record<string, string>;
    body?: string;
    connections?: number;
    /** Seconds. */
    duration?: number;
    timeout?: number;
  }

  interface Histogram {
    average: number;
    mean: number;
    stddev: number;
    min: number;
    max: number;
    total: number;
    p50: number;
    p90: number;
    p99: number;
  }

  interface Result {
    requests: Histogram;
    latency: Histogram;
    throughput: Histogram;
    /** Seconds the run took. */
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    '2xx': number;
  }

  interface Instance extends EventEmitter {
    on(event: 'response', listener: (client: unknown, statusCode: number, bytes: number, responseTimeMs: number) => void): this;
    on(event: 'done', listener: (result: Result) => void): this;
  }

  function autocannon(options: Options, callback: (error: Error | null, result: Result) => void): Instance;
  export = autocannon;
}
