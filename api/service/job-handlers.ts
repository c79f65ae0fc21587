import type { Context } from 'hono';
import { mapRunsOf } from '../operations/map-runs.ts';
import type { ServiceContext } from '../operations/service-context.ts';
import { isFinished, type MapRunRecord, type RunRecord } from '../store/index.ts';
import { HttpError, found } from './http-error.ts';

/** The record of each kind of run, by the name the API gives it. */
interface JobRecords {
  readonly run: RunRecord;
  readonly map: MapRunRecord;
}

/** Where the store keeps one kind of run, and what stops one of this process. */
interface JobKind<R> {
  store(ctx: ServiceContext): {
    get(id: string): R | undefined;
    listForStudy(studyId: string): R[];
    finishWithout(id: string, status: 'cancelled', error: string): boolean;
  };
  /** Stops a run; false when none of this process's threads is working on it. */
  cancel(ctx: ServiceContext, id: string): boolean;
}

const KINDS: { readonly [K in keyof JobRecords]: JobKind<JobRecords[K]> } = {
  run: { store: (ctx) => ctx.store.runs, cancel: (ctx, id) => ctx.scheduler.cancel(id) },
  map: { store: (ctx) => ctx.store.maps, cancel: (ctx, id) => mapRunsOf(ctx).cancel(id) },
};

/**
 * What the API does alike for screening runs and map runs, as handlers for the routes that name
 * their paths (`/studies/:id/<noun>s`, `/<noun>s/:<noun>Id`, `/<noun>s/:<noun>Id/cancel`): a
 * study's list, one by id (`find`: 404 when there is none), and its cancel. `json` is the record
 * as the API shows it.
 */
export function jobHandlers<K extends keyof JobRecords>(
  ctx: ServiceContext,
  noun: K,
  json: (record: JobRecords[K]) => unknown,
) {
  const kind = KINDS[noun] as JobKind<JobRecords[K]>;
  const store = kind.store(ctx);
  const find = (id: string): JobRecords[K] => found(store.get(id), noun, id);
  const idOf = (c: Context) => c.req.param(`${noun}Id`) as string;
  return {
    find,
    list: (c: Context) => {
      const id = c.req.param('id') as string;
      found(ctx.store.studies.get(id), 'study', id);
      return c.json({ [`${noun}s`]: store.listForStudy(id).map(json) });
    },
    one: (c: Context) => c.json(json(find(idOf(c)))),
    cancel: (c: Context) => {
      const id = idOf(c);
      const run = find(id);
      if (isFinished(run.status))
        throw new HttpError(
          409,
          `${noun} "${id}" is already ${run.status}; only a queued or running ${noun} can be cancelled`,
        );
      // Every unfinished run belongs to this process (the store marks the others interrupted at open).
      if (!kind.cancel(ctx, id)) store.finishWithout(id, 'cancelled', 'cancelled on request');
      return c.json(json(find(id)), 202);
    },
  };
}
