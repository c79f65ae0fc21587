import type { Study } from '../engine/model.ts';
import type { ServiceContext } from './service-context.ts';
import { checkWorkBudget, type StudyWork } from './work-budget.ts';

/**
 * The work of a study, measured by discretising it on the quick pool (it takes about a second
 * for the demo, too long for the request thread); throws StudyTooLarge over the budget.
 */
export async function measureStudy(ctx: ServiceContext, study: Study): Promise<StudyWork> {
  const { ruptures } = await ctx.quickPool.run({ kind: 'measure', study }).result;
  return checkWorkBudget(study, ruptures, ctx.workBudget);
}
