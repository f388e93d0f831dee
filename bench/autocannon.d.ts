/** The part of autocannon 9's API that bench/load.ts uses (the package ships no types). */
declare module "autocannon" {
  import type { EventEmitter } from "node:events";

  interface Histogram {
    average: number;
    mean: number;
    stddev: number;
    min: number;
    max: number;
    total: number;
    p50: number;
    p90: number;
    p97_5: number;
    p99: number;
  }
  interface Result {
    requests: Histogram;
    latency: Histogram;
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    resets: number;
    statusCodeStats: Record<string, { count: number }>;
    "2xx": number;
  }
  export interface RawRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string | Buffer;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    pipelining?: number;
    timeout?: number;
    headers?: Record<string, string>;
    requests?: {
      method?: string;
      path?: string;
      setupRequest?: (req: RawRequest, context: Record<string, unknown>) => RawRequest | undefined;
      onResponse?: (status: number, body: string, context: Record<string, unknown>, headers: Record<string, string>) => void;
    }[];
  }
  interface Instance extends EventEmitter, PromiseLike<Result> {}
  function autocannon(options: Options): Instance;
  export default autocannon;
}
