import { Cancelled } from '../engine/errors.ts';
import type { Study } from '../engine/model.ts';
import { modelCatalog } from '../engine/motion/registry.ts';
import type { Provenance } from '../engine/results.ts';
import { finishScreening, type ScreeningOutput } from '../engine/screen-study.ts';
import { screeningSetup } from '../engine/screening-plan.ts';
import { buildProvenance } from '../results/provenance.ts';
import { newPlanKey, runChunks, type ChunkPool } from './chunk-runner.ts';
import type { ScreenOutput } from './messages.ts';
import { tableOnPool } from './shared-table.ts';
import type { TaskHandle, WorkerPool } from './worker-pool.ts';

/** A screening's results as JSON text, piece by piece (the service stores them without parsing). */
export interface ScreeningText {
  readonly studyName: string;
  readonly warnings: readonly string[];
  readonly diagnostics: ScreeningOutput['diagnostics'];
  /** Each chunk's communities as a JSON array, in study order. */
  readonly communityChunks: readonly string[];
}

/** The StudyResult JSON (results.ts, keys in its order) of a screening and its provenance. */
export function screeningJson(text: ScreeningText, provenance: Provenance): string {
  const communities = text.communityChunks
    .map((chunk) => chunk.slice(1, -1))
    .filter((inner) => inner.length > 0);
  return `{"studyName":${JSON.stringify(text.studyName)},"communities":[${communities.join(',')}],"warnings":${JSON.stringify(text.warnings)},"diagnostics":${JSON.stringify(text.diagnostics)},"provenance":${JSON.stringify(provenance)}}`;
}

/** The screening's results as objects (the CLI prints from them). */
export function screeningOutput(text: ScreeningText): ScreeningOutput {
  return {
    studyName: text.studyName,
    communities: text.communityChunks.flatMap(
      (chunk) => JSON.parse(chunk) as ScreeningOutput['communities'],
    ),
    warnings: [...text.warnings],
    diagnostics: text.diagnostics,
  };
}

export interface ParallelScreenOptions {
  /** The first thread took the work (ISO time). */
  readonly onStart?: (at: string) => void;
  /** Share of the work done, in (0, 1]. */
  readonly onProgress?: (shareDone: number) => void;
  /** Communities per task; by default enough tasks for each thread to take about four. */
  readonly chunkSize?: number;
  /** Where the chunks of communities go (the Redis queue, api/queue); the pool's own threads by default. */
  readonly chunks?: ChunkPool;
}

/**
 * Screens a study over the pool's threads: the threads lay the study's ruptures out in a table
 * on shared memory (tableOnPool), then the communities are handed out in chunks, each thread building its plan once and taking chunks until none are left. The numbers are
 * screenStudy's (the same engine functions, community by community). The models are the
 * registry's (a worker thread has no other). Cancel stops every chunk (Cancelled).
 */
export function screenStudyOnPool(
  pool: WorkerPool,
  study: Study,
  options: ParallelScreenOptions = {},
): TaskHandle<ScreeningText> {
  let cancelled = false;
  let active: { cancel(): void } | undefined;
  const result = (async (): Promise<ScreeningText> => {
    // Branches and study warnings are checked here first: a bad study fails before any thread works.
    const setup = screeningSetup(study, modelCatalog);
    const tableTask = tableOnPool(pool, study, options.onStart ? { onStart: options.onStart } : {});
    active = tableTask;
    const table = await tableTask.result;
    if (cancelled) throw new Cancelled(0);
    const count = study.communities.length;
    const chunks = options.chunks ?? pool;
    const chunkSize = options.chunkSize ?? Math.max(1, Math.ceil(count / (4 * chunks.size)));
    const groups: number[][] = [];
    for (let first = 0; first < count; first += chunkSize)
      groups.push(Array.from({ length: Math.min(chunkSize, count - first) }, (_, i) => first + i));
    const planKey = newPlanKey();
    const run = runChunks(chunks, {
      tasks: groups.map((indices) => ({
        kind: 'screen-communities' as const,
        planKey,
        study,
        table,
        indices,
      })),
      weights: groups.map((c) => c.length),
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    });
    active = run;
    const outputs = await run.result;
    const { warnings, studyName, diagnostics } = finishScreening(
      { ...setup, ruptureCount: table.count },
      [],
    );
    return {
      studyName,
      warnings,
      diagnostics,
      communityChunks: outputs.map((o) => o.communitiesJson),
    };
  })();
  return {
    result,
    cancel() {
      cancelled = true;
      active?.cancel();
    },
  };
}

/**
 * A screening spread over the pool as a 'screen' task's output: the results JSON with its
 * provenance (built here, on the calling thread: it needs the clock), for the run scheduler.
 */
export function spreadScreening(
  pool: WorkerPool,
  study: Study,
  inputHash: string,
  toolVersion: string,
  events: {
    readonly onStart?: (at: string) => void;
    readonly onProgress?: (share: number) => void;
  },
  chunks?: ChunkPool,
): TaskHandle<ScreenOutput> {
  const startedAt = new Date().toISOString();
  const handle = screenStudyOnPool(pool, study, {
    ...(events.onStart ? { onStart: events.onStart } : {}),
    ...(events.onProgress ? { onProgress: events.onProgress } : {}),
    ...(chunks ? { chunks } : {}),
  });
  return {
    result: handle.result.then((text) => {
      const provenance = buildProvenance({
        study,
        toolVersion,
        inputHash,
        startedAt,
        finishedAt: new Date().toISOString(),
      });
      return { resultsJson: screeningJson(text, provenance), provenance };
    }),
    cancel: () => handle.cancel(),
  };
}
