import { inputHash } from '../results/input-hash.ts';
import { terrainGridsOf } from './terrain-grids.ts';
import type { ServiceContext } from './service-context.ts';
import { measureStudy } from './study-size.ts';
import type { StudyWork } from './work-budget.ts';
import { storedInputs, validateStudy } from './study-input.ts';
import type { RunRecord, StudyRecord } from '../store/index.ts';

/**
 * Starts a run of a saved study (POST /api/studies/{id}/runs, the pages, the demo at first start): the saved inputs are
 * validated and measured against the work budget first (InvalidInput or StudyTooLarge when
 * they fail; no run is recorded), then the run is recorded and handed to the scheduler.
 * Undefined when the study was deleted while it was measured.
 */
export async function startScreening(
  ctx: ServiceContext,
  record: StudyRecord,
  signal?: AbortSignal,
): Promise<{ readonly run: RunRecord; readonly work: StudyWork } | undefined> {
  const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
  const { study } = validateStudy(inputs.raw, ctx.models, inputs);
  const work = await measureStudy(ctx, study, signal);
  // The study may have been deleted while it was measured.
  if (!ctx.store.studies.get(record.id)) return undefined;
  const run = ctx.store.runs.create({
    studyId: record.id,
    document: inputs.document,
    ...(inputs.communitiesCsv === undefined ? {} : { communitiesCsv: inputs.communitiesCsv }),
    inputHash: inputHash(study),
  });
  ctx.scheduler.start(run, study);
  return { run, work };
}
