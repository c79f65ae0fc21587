import { InvalidInput } from '../engine/errors.ts';
import { text } from '../study/fields.ts';
import { fromZod } from '../study/issues.ts';
import { isFinished } from '../store/run-repository.ts';
import type { StudyRecord } from '../store/index.ts';
import type { StudyWrite } from '../store/study-repository.ts';
import { mapRunsOf } from './map-runs.ts';
import type { ServiceContext } from './service-context.ts';
import { storedInputs, validateDraft, type StudyFiles } from './study-input.ts';
import { terrainGridsOf } from './terrain-grids.ts';

/**
 * What an imported communities file is called in the study document (DESIGN.md section 2 lets
 * `communities` name a CSV file); the CSV itself is kept in the store beside the study.
 */
export const IMPORTED_COMMUNITIES_FILE = 'communities.csv';

export interface NewStudy {
  readonly name: string;
  /** Communities as CSV with Tremora's header (a village file read by community-files/). */
  readonly communitiesCsv?: string;
}

/** A write of `document` once it validates as a draft at least; InvalidInput lists every problem. */
function checkedWrite(
  ctx: ServiceContext,
  document: Record<string, unknown>,
  files: StudyFiles,
): StudyWrite {
  const { study } = validateDraft(document, ctx.models, files);
  const { communitiesCsv } = files;
  return {
    name: study.name,
    document: JSON.stringify(document, null, 2),
    ...(communitiesCsv === undefined
      ? {}
      : { file: { kind: 'communities-csv', content: communitiesCsv } }),
  };
}

/**
 * Creates a study from the pages: a name and, when given, the communities of a village file;
 * no sources yet. Such a study is a draft (validateDraft) until it has communities and sources.
 * Throws InvalidInput (nothing saved) when the name or the communities do not validate.
 */
export function createStudy(ctx: ServiceContext, input: NewStudy): StudyRecord {
  const document = {
    name: input.name,
    communities: input.communitiesCsv === undefined ? [] : IMPORTED_COMMUNITIES_FILE,
    sources: { type: 'FeatureCollection', features: [] },
  };
  return ctx.store.studies.create(
    checkedWrite(ctx, document, { communitiesCsv: input.communitiesCsv }),
  );
}

/**
 * A copy of a saved study under `name`: its document and the communities file it names; not its
 * runs, maps or catalog, which belong to the original. Undefined when there is no such study.
 */
export function duplicateStudy(
  ctx: ServiceContext,
  id: string,
  name: string,
): StudyRecord | undefined {
  return ctx.store.transaction(() => {
    const record = ctx.store.studies.get(id);
    if (!record) return undefined;
    const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
    return ctx.store.studies.create(checkedWrite(ctx, { ...inputs.raw, name }, inputs));
  });
}

/**
 * Renames a saved study: its document is read, given the new name and validated in the
 * transaction that writes it, so no save made meanwhile is lost. Undefined when there is none.
 */
export function renameStudy(
  ctx: ServiceContext,
  id: string,
  name: string,
): StudyRecord | undefined {
  return ctx.store.studies.update(id, (current) => {
    const inputs = storedInputs(ctx.store, current, terrainGridsOf(ctx));
    const { study } = validateDraft({ ...inputs.raw, name }, ctx.models, inputs);
    return { name: study.name, document: JSON.stringify({ ...inputs.raw, name }, null, 2) };
  });
}

/** What is deleted with a study, counted from the store. */
export interface StudyDependents {
  readonly runs: number;
  readonly maps: number;
  /** 1 when the study has an earthquake catalog attached. */
  readonly catalogs: number;
  /** Awareness visits recorded for the study's communities. */
  readonly visits: number;
  /** Runs and maps still queued or running: they are stopped first. */
  readonly unfinished: number;
}

/** Counts what goes with a study when it is deleted; undefined when there is no such study. */
export function studyDependents(ctx: ServiceContext, id: string): StudyDependents | undefined {
  if (!ctx.store.studies.get(id)) return undefined;
  const runs = ctx.store.runs.listForStudy(id);
  const maps = ctx.store.maps.listForStudy(id);
  return {
    runs: runs.length,
    maps: maps.length,
    catalogs: ctx.store.catalogs.get(id) ? 1 : 0,
    visits: ctx.store.visits.count(id),
    unfinished: [...runs, ...maps].filter((r) => !isFinished(r.status)).length,
  };
}

/**
 * Deletes a study with its files, runs, maps and catalog (the store cascades), stopping its
 * unfinished runs and maps first. False when there was no such study.
 */
export function deleteStudy(ctx: ServiceContext, id: string): boolean {
  if (!ctx.store.studies.get(id)) return false;
  for (const run of ctx.store.runs.listForStudy(id)) ctx.scheduler.cancel(run.id);
  for (const map of ctx.store.maps.listForStudy(id)) mapRunsOf(ctx).cancel(map.id);
  return ctx.store.studies.delete(id);
}

/**
 * The `{ name }` body of a rename or a copy: any other key is refused, naming it, so that a
 * document sent to the wrong address (a whole study, say) changes nothing.
 */
export function readNameBody(body: Readonly<Record<string, unknown>>): string {
  const extra = Object.keys(body).filter((key) => key !== 'name');
  if (extra.length > 0)
    throw new InvalidInput(
      extra.map((key) => ({ path: key, message: 'unexpected field; the body is { "name": ... }' })),
      'invalid name',
    );
  return readStudyName(body.name);
}

/** The name of a study, as a form or a body gives it; InvalidInput naming `name` otherwise. */
export function readStudyName(raw: unknown): string {
  const result = text(200, 'a study name').safeParse(raw, { reportInput: true });
  if (!result.success) throw new InvalidInput(fromZod(result.error, ['name']), 'invalid name');
  return result.data;
}
