import type { ServiceContext } from '../../api/operations/service-context.ts';
import { RecentCache } from './recent-cache.ts';

/**
 * What the pages read of done runs, parsed once and kept by run id: a done run never changes
 * (the store refuses it), so the few most recently read are kept. The cache lives with the pages.
 */
export class DoneRunCache<T> {
  readonly #recent: RecentCache<T>;
  readonly #read: (ctx: ServiceContext, runId: string) => T | undefined;

  /** `read` reads and parses a run's output from the store: undefined when there is none. */
  constructor(capacity: number, read: (ctx: ServiceContext, runId: string) => T | undefined) {
    this.#recent = new RecentCache(capacity);
    this.#read = read;
  }

  get(ctx: ServiceContext, runId: string): T | undefined {
    return this.#recent.get(runId, () => this.#read(ctx, runId));
  }
}
