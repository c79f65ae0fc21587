import { Cancelled } from '../engine/errors.ts';
import type { TaskKind, TaskOutputs, WorkerTask } from '../workers/messages.ts';
import type { ServiceContext } from './service-context.ts';

/** How long a request may keep the quick thread by default, s (TREMORA_QUICK_LIMIT_S). */
export const DEFAULT_QUICK_LIMIT_S = 60;

/** A task on the quick thread ran past its time limit and was stopped (answered 503). */
export class QuickTaskTooLong extends Error {
  override name = 'QuickTaskTooLong';
  constructor(readonly limitS: number) {
    super(
      `the check took longer than ${limitS} s on the service's quick thread and was stopped; ` +
        'make the study smaller (fewer sources, vertices or finer cells) or ask again when the service is less busy',
    );
  }
}

/**
 * Runs a task on the quick thread for a request: stopped when the request's client goes away
 * (`signal`), and stopped with QuickTaskTooLong past the time limit, so one request cannot hold
 * the thread that every other request's checks wait on.
 */
export async function runQuickTask<K extends TaskKind>(
  ctx: ServiceContext,
  task: Extract<WorkerTask, { kind: K }>,
  signal?: AbortSignal,
): Promise<TaskOutputs[K]> {
  const handle = ctx.quickPool.run(task);
  const limitS = ctx.quickLimitS ?? DEFAULT_QUICK_LIMIT_S;
  let timer: NodeJS.Timeout | undefined;
  let onAbort: (() => void) | undefined;
  // Whichever comes first: the answer, the time limit, or the client going away. A task stopped
  // just as it finished still counts as stopped: its caller has already been told so.
  const stopped = new Promise<never>((_, reject) => {
    const stop = (reason: Error): void => {
      handle.cancel();
      reject(reason);
    };
    timer = setTimeout(() => stop(new QuickTaskTooLong(limitS)), limitS * 1000);
    onAbort = () => stop(new Cancelled(0));
    if (signal?.aborted) onAbort();
    else signal?.addEventListener('abort', onAbort, { once: true });
  });
  try {
    return await Promise.race([handle.result, stopped]);
  } finally {
    clearTimeout(timer);
    if (onAbort) signal?.removeEventListener('abort', onAbort);
  }
}
