/**
 * The part of autocannon 9's programmatic API the load benchmark uses (the package ships no
 * types and there is no @types package for it). Shapes from its README and lib/aggregateResult.js.
 */
declare module "autocannon" {
  import type { EventEmitter } from "node:events";

  export interface RawRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
  }

  export interface RequestSpec extends RawRequest {
    /** Called before each send; the request it returns is the one sent. */
    setupRequest?: (request: RawRequest, context: Record<string, unknown>) => RawRequest;
  }

  export interface Options {
    url: string;
    connections?: number;
    /** Seconds. */
    duration?: number;
    pipelining?: number;
    /** Seconds before a request counts as timed out. */
    timeout?: number;
    method?: string;
    headers?: Record<string, string>;
    requests?: RequestSpec[];
    title?: string;
  }

  /** Percentiles are keyed p50, p90, p97_5, p99, p99_9 …; latency values are milliseconds. */
  export interface Histogram {
    average: number;
    mean: number;
    stddev: number;
    min: number;
    max: number;
    total?: number;
    p50: number;
    p90: number;
    p97_5: number;
    p99: number;
    p99_9: number;
  }

  export interface Result {
    title?: string;
    url: string;
    connections: number;
    /** Seconds. */
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    resets: number;
    "1xx": number;
    "2xx": number;
    "3xx": number;
    "4xx": number;
    "5xx": number;
    statusCodeStats: Record<string, { count: number }>;
    /** Only 2xx responses are recorded here. */
    latency: Histogram & { totalCount: number };
    /** Responses per second, whatever their status. */
    requests: Histogram & { sent: number };
    throughput: Histogram;
  }

  export interface Instance extends EventEmitter, PromiseLike<Result> {
    stop(): void;
  }

  function autocannon(opts: Options): Instance;
  export default autocannon;
}
