import { InvalidInput, type InputIssue } from '../../api/engine/errors.ts';
import { terrainGridsOf } from '../../api/operations/terrain-grids.ts';
import type { Study } from '../../api/engine/model.ts';
import type { StudyResult } from '../../api/engine/results.ts';
import { inputHash } from '../../api/results/input-hash.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';
import type { StudyPart } from '../../api/study/load-study.ts';
import {
  storedInputs,
  validateDraft,
  validateStudy,
  type StoredInputs,
} from '../../api/operations/study-input.ts';
import type { RunRecord, StudyRecord } from '../../api/store/index.ts';
import { DoneRunCache } from './done-run-cache.ts';

/** A saved study as the pages read it, in-process from the store. */
export type StudyData =
  | {
      readonly ok: true;
      readonly record: StudyRecord;
      readonly inputs: StoredInputs;
      readonly study: Study;
      readonly hash: string;
      /** What a draft still lacks (read with `drafts`); empty for a complete study. */
      readonly missing: readonly StudyPart[];
    }
  | {
      readonly ok: false;
      readonly record: StudyRecord;
      readonly inputs: StoredInputs;
      readonly issues: readonly InputIssue[];
      /** When the study is a valid draft: what it still lacks (else empty). */
      readonly missing: readonly StudyPart[];
    };

/**
 * The study with `id`, validated; undefined when there is none. With `drafts` (the editor), a
 * study without communities or sources yet reads as ok with what it lacks in `missing`; without
 * (the pages that show or compute numbers) it is not ok, with `missing` saying why.
 */
export function readStudy(
  ctx: ServiceContext,
  id: string,
  options: { readonly drafts?: boolean } = {},
): StudyData | undefined {
  const record = ctx.store.studies.get(id);
  if (!record) return undefined;
  const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
  const draft = () => {
    try {
      return validateDraft(inputs.raw, ctx.models, inputs);
    } catch (error) {
      if (error instanceof InvalidInput) return undefined;
      throw error;
    }
  };
  try {
    if (options.drafts) {
      const { study, missing } = validateDraft(inputs.raw, ctx.models, inputs);
      return { ok: true, record, inputs, study, hash: inputHash(study), missing };
    }
    const { study } = validateStudy(inputs.raw, ctx.models, inputs);
    return { ok: true, record, inputs, study, hash: inputHash(study), missing: [] };
  } catch (error) {
    // A study saved before a rule changed may no longer validate; the pages say so.
    if (error instanceof InvalidInput)
      return { ok: false, record, inputs, issues: error.issues, missing: draft()?.missing ?? [] };
    throw error;
  }
}

export interface Screening {
  readonly run: RunRecord;
  readonly results: StudyResult;
  /** False when the study has changed since this run (its inputs hash differently). */
  readonly current: boolean;
}

export interface RunState {
  /** The newest run of any status. */
  readonly latest?: RunRecord;
  /** The newest done run with its results. */
  readonly screening?: Screening;
}

/**
 * Results of done runs never change (the store refuses it), so parsed results are kept by run
 * id; the cache lives with the pages (createPages), holding the few most recent.
 */
export class ResultsCache extends DoneRunCache<StudyResult> {
  constructor(capacity = 8) {
    super(capacity, (ctx, runId) => {
      const text = ctx.store.runs.results(runId);
      return text === undefined ? undefined : (JSON.parse(text) as StudyResult);
    });
  }
}

/** The study's newest run and newest done run (with results). */
export function readRuns(
  ctx: ServiceContext,
  cache: ResultsCache,
  studyId: string,
  currentHash: string | undefined,
): RunState {
  const runs = ctx.store.runs.listForStudy(studyId);
  const latest = runs[runs.length - 1];
  const done = [...runs].reverse().find((r) => r.status === 'done');
  const results = done ? cache.get(ctx, done.id) : undefined;
  return {
    ...(latest ? { latest } : {}),
    ...(done && results
      ? { screening: { run: done, results, current: done.inputHash === currentHash } }
      : {}),
  };
}
