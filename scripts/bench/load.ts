import autocannon from "autocannon";
import { percentile } from "./stats";

export interface LoadRequest {
  method: "GET" | "POST";
  path: string;
  headers?: Record<string, string>;
  body?: string;
}

export interface LoadOptions {
  baseUrl: string;
  connections: number;
  durationSeconds: number;
  /** A fixed request, or one built afresh for every request sent (e.g. the next unused attempt). */
  request: LoadRequest | (() => LoadRequest);
  /** Caps the number of requests (e.g. the size of a pool of one-use attempts); the run may then end early. */
  maxRequests?: number;
}

export interface LoadResult {
  responses: number;
  seconds: number;
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  /** Count of each status code answered. */
  statuses: Record<number, number>;
  errors: number;
  timeouts: number;
}

/** Status counts as "200×1234, 409×2". */
export function describeStatuses(statuses: Record<number, number>): string {
  return Object.entries(statuses)
    .map(([status, count]) => `${status}×${count}`)
    .join(", ");
}

/**
 * Sends requests from `connections` keep-alive connections to the server on 127.0.0.1 for at most
 * `durationSeconds` (and at most `maxRequests`), with autocannon. Latency percentiles are computed from
 * every response time, not autocannon's summary (which has no p95).
 */
export async function runLoad(options: LoadOptions): Promise<LoadResult> {
  const url = new URL(options.baseUrl);
  if (url.hostname !== "127.0.0.1") throw new Error(`load tests only go to 127.0.0.1, not ${url.hostname}`);
  const { request } = options;
  const build = typeof request === "function" ? request : () => request;
  const first = build();
  const times: number[] = [];
  const statuses: Record<number, number> = {};

  const instance = autocannon({
    url: options.baseUrl,
    connections: options.connections,
    duration: options.durationSeconds,
    timeout: 10,
    ...(options.maxRequests ? { maxOverallRequests: options.maxRequests } : {}),
    requests: [
      {
        ...first,
        setupRequest: (params) => {
          const next = typeof request === "function" ? build() : request;
          return { ...params, ...next, headers: { ...next.headers } };
        },
      },
    ],
  });
  instance.on("response", (_client, statusCode, _bytes, responseTime) => {
    times.push(responseTime);
    statuses[statusCode] = (statuses[statusCode] ?? 0) + 1;
  });
  const result = await instance;
  const seconds = result.duration;
  return {
    responses: times.length,
    seconds,
    requestsPerSecond: seconds > 0 ? times.length / seconds : 0,
    p50Ms: percentile(times, 50),
    p95Ms: percentile(times, 95),
    p99Ms: percentile(times, 99),
    statuses,
    errors: result.errors,
    timeouts: result.timeouts,
  };
}
