import type { Context } from 'hono';
import { isFinished } from '../store/index.ts';
import type { JobRecord } from '../store/job-table.ts';
import type { ServiceContext } from '../operations/service-context.ts';
import { HttpError, found } from './http-error.ts';

/** The store's side of one kind of run: screening runs or map runs. */
interface JobStore<R extends JobRecord> {
  get(id: string): R | undefined;
  listForStudy(studyId: string): R[];
  finishWithout(id: string, status: 'cancelled', error: string): boolean;
}

export interface JobHandlersOptions<R extends JobRecord> {
  /** The kind's name in answers and messages ("run", "map"); its plural keys the study's list. */
  readonly noun: 'run' | 'map';
  /** The path parameter that holds the run's id (`runId` in `/runs/:runId`). */
  readonly param: string;
  readonly store: JobStore<R>;
  /** The record as the API shows it. */
  readonly json: (record: R) => unknown;
  /** Stops a run of this process; false when none of its threads is working on it. */
  readonly cancel: (id: string) => boolean;
}

/**
 * What the API does alike for screening runs and map runs, as handlers for the routes that name
 * their paths: a study's list, one by id (404 when there is none), and its cancel.
 */
export function jobHandlers<R extends JobRecord>(
  ctx: ServiceContext,
  options: JobHandlersOptions<R>,
) {
  const { noun, store, json } = options;
  const find = (id: string): R => found(store.get(id), noun, id);
  const idOf = (c: Context) => c.req.param(options.param) as string;
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
      if (!options.cancel(id)) store.finishWithout(id, 'cancelled', 'cancelled on request');
      return c.json(json(find(id)), 202);
    },
  };
}
