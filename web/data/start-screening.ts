import { inputHash } from '../../api/results/input-hash.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';
import { measureStudy } from '../../api/operations/study-size.ts';
import { storedInputs, validateStudy } from '../../api/operations/study-input.ts';
import type { RunRecord, StudyRecord } from '../../api/store/index.ts';

/**
 * Starts a run of a saved study, as POST /api/studies/{id}/runs does: the saved inputs are
 * validated and measured against the work budget first (InvalidInput or StudyTooLarge when
 * they fail; no run is recorded), then the run is recorded and handed to the scheduler.
 */
export async function startScreening(
  ctx: ServiceContext,
  record: StudyRecord,
): Promise<RunRecord | undefined> {
  const inputs = storedInputs(ctx.store, record);
  const { study } = validateStudy(inputs.raw, ctx.models, inputs.communitiesCsv);
  await measureStudy(ctx, study);
  // The study may have been deleted while it was measured.
  if (!ctx.store.studies.get(record.id)) return undefined;
  const run = ctx.store.runs.create({
    studyId: record.id,
    document: inputs.document,
    ...(inputs.communitiesCsv === undefined ? {} : { communitiesCsv: inputs.communitiesCsv }),
    inputHash: inputHash(study),
  });
  ctx.scheduler.start(run, study);
  return run;
}
