// The few parts of autocannon 9's programmatic API that the benchmark uses (the package ships no types).
declare module "autocannon" {
  import type { EventEmitter } from "node:events";

  interface RequestParams {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
  }

  interface Request extends RequestParams {
    setupRequest?: (request: RequestParams & Record<string, unknown>, context: Record<string, unknown>) => RequestParams | null;
  }

  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    maxOverallRequests?: number;
    timeout?: number;
    pipelining?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: Request[];
  }

  interface Result {
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    requests: { total: number; average: number };
    latency: { p50: number; p99: number };
  }

  interface Instance extends EventEmitter, PromiseLike<Result> {
    stop(): void;
    on(event: "response", listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): this;
    on(event: "reqError", listener: (error: Error) => void): this;
    on(event: string, listener: (...args: unknown[]) => void): this;
  }

  function autocannon(options: Options): Instance;
  export default autocannon;
}
