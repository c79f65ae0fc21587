import { createRequire } from 'node:module';

/** What autocannon reports of one load, as the tests and benchmarks read it. */
export interface AutocannonResult {
  readonly latency: {
    readonly p50: number;
    readonly p97_5: number;
    readonly p99: number;
    readonly max: number;
    readonly average: number;
  };
  readonly requests: { readonly average: number; readonly total: number };
  readonly non2xx: number;
  readonly errors: number;
  readonly timeouts: number;
  readonly resets: number;
}

export interface AutocannonOptions {
  readonly url: string;
  readonly connections: number;
  readonly duration: number;
  readonly method?: string;
  readonly headers?: Record<string, string>;
  readonly body?: string;
  /** Seconds before a request counts as timed out. */
  readonly timeout?: number;
}
export type Autocannon = (options: AutocannonOptions) => Promise<AutocannonResult>;
// autocannon ships no type declarations; this is the part of its API used here.
export const autocannon = createRequire(import.meta.url)('autocannon') as Autocannon;
