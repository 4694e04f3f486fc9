// The few parts of autocannon 9 the benchmark uses (the package ships no types).
declare module 'autocannon' {
  export interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    timeout?: number;
    requests?: Array<{
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (
        request: Record<string, unknown>,
        context: Record<string, unknown>,
      ) => unknown;
      onResponse?: (status: number, body: string, context: Record<string, unknown>) => void;
    }>;
  }
  export interface Histogram {
    average: number;
    p50: number;
    p90: number;
    p99: number;
    max: number;
    total: number;
  }
  export interface Result {
    /** Seconds the run lasted. */
    duration: number;
    requests: Histogram;
    latency: Histogram;
    throughput: Histogram;
    non2xx: number;
    errors: number;
    timeouts: number;
    statusCodeStats: Record<string, { count: number }>;
    '1xx': number;
    '2xx': number;
    '3xx': number;
    '4xx': number;
    '5xx': number;
  }
  export interface Instance extends PromiseLike<Result> {
    stop(): void;
  }
  export default function autocannon(options: Options): Instance;
}
