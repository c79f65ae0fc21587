import type { Study } from '../engine/model.ts';
import { runQuickTask } from './quick-task.ts';
import type { ServiceContext } from './service-context.ts';
import { checkWorkBudget, type StudyWork } from './work-budget.ts';

/**
 * The work of a study, measured by discretising it on the quick pool (it takes about a second
 * for the demo, too long for the request thread); throws StudyTooLarge over the budget, and
 * stops when `signal` says the request's client has gone or past the quick thread's time limit.
 */
export async function measureStudy(
  ctx: ServiceContext,
  study: Study,
  signal?: AbortSignal,
): Promise<StudyWork> {
  const measured = await runQuickTask(ctx, { kind: 'measure', study }, signal);
  return checkWorkBudget(study, measured, ctx.workBudget);
}
