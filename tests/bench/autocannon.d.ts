// The few parts of autocannon 9 the benchmarks use (the package ships no types).
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';
  interface Request {
    method?: string;
    path?: string;
    body?: string;
    setupRequest?: (request: Request) => Request;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    method?: string;
    headers?: Record<string, string>;
    requests?: Request[];
  }
  interface Result {
    requests: { average: number; total: number };
    latency: { p50: number; p90: number; p97_5: number; p99: number; average: number };
    non2xx: number;
    errors: number;
    timeouts: number;
    duration: number;
  }
  interface Instance extends EventEmitter, PromiseLike<Result> {
    on(
      event: 'response',
      listener: (client: unknown, statusCode: number, resBytes: number, responseTimeMs: number) => void,
    ): this;
  }
  function autocannon(options: Options): Instance;
  export default autocannon;
}
