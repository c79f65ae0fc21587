import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import type { StudyResult } from '../../engine/results.ts';
import type { RunRecord } from '../../store/index.ts';
import { HttpError, notFound, found } from '../http-error.ts';
import { jobHandlers } from '../job-handlers.ts';
import { runCsv } from '../../results/run-csv.ts';
import { runGeoJson } from '../../results/run-geojson.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { startScreening } from '../../operations/start-screening.ts';
import { runStudy } from '../../operations/study-input.ts';

/** A run as the API shows it: its state, provenance (once done) and links; results are separate. */
export const runJson = (run: RunRecord) => ({
  id: run.id,
  studyId: run.studyId,
  status: run.status,
  progress: run.progress,
  inputHash: run.inputHash,
  createdAt: run.createdAt,
  startedAt: run.startedAt,
  finishedAt: run.finishedAt,
  error: run.error,
  provenance: run.provenance === null ? null : (JSON.parse(run.provenance) as unknown),
  links: {
    self: `/api/runs/${run.id}`,
    study: `/api/studies/${run.studyId}`,
    results: `/api/runs/${run.id}/results`,
    csv: `/api/runs/${run.id}/results.csv`,
    geojson: `/api/runs/${run.id}/results.geojson`,
    cancel: `/api/runs/${run.id}/cancel`,
  },
});

/** Runs of saved studies: start, follow, cancel, read and export results. */
export function runRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  const { studies, runs } = ctx.store;
  const jobs = jobHandlers(ctx, 'run', runJson);

  /** A done run's results with the study it computed (for coordinates); 409 before that. */
  const finishedResults = (id: string) => {
    const run = jobs.find(id);
    const text = runs.results(id);
    if (run.status !== 'done' || text === undefined) {
      throw new HttpError(
        409,
        `run "${id}" is ${run.status}; results exist only once it is done${run.error ? ` (${run.error})` : ''}`,
      );
    }
    return { run, text };
  };

  /** A done run's study, as the run computed it, and its results. */
  const finishedStudy = (id: string) => {
    const { run, text } = finishedResults(id);
    const inputs = runs.inputs(id) as NonNullable<ReturnType<typeof runs.inputs>>;
    const { study } = runStudy(inputs, ctx.models, terrainGridsOf(ctx));
    return { run, study, result: JSON.parse(text) as StudyResult };
  };

  app.post('/studies/:id/runs', async (c) => {
    const id = c.req.param('id');
    const record = found(studies.get(id), 'study', id);
    const started = await startScreening(ctx, record, c.req.raw.signal);
    if (!started) throw notFound('study', id);
    const { run, work } = started;
    return c.json(
      { ...runJson(run), work: { size: work.size, budget: ctx.workBudget, detail: work.detail } },
      202,
      { Location: `/api/runs/${run.id}` },
    );
  });

  app.get('/studies/:id/runs', jobs.list);
  app.get('/runs/:runId', jobs.one);

  app.get('/runs/:runId/results', (c) => {
    const { text } = finishedResults(c.req.param('runId'));
    return c.body(text, 200, { 'Content-Type': 'application/json; charset=utf-8' });
  });

  app.get('/runs/:runId/results.csv', (c) => {
    const { run, study, result } = finishedStudy(c.req.param('runId'));
    return c.body(runCsv(study, result), 200, {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="tremora-run-${run.id}.csv"`,
    });
  });

  app.get('/runs/:runId/results.geojson', (c) => {
    const { run, study, result } = finishedStudy(c.req.param('runId'));
    return c.body(JSON.stringify(runGeoJson(study, result)), 200, {
      'Content-Type': 'application/geo+json; charset=utf-8',
      'Content-Disposition': `attachment; filename="tremora-run-${run.id}.geojson"`,
    });
  });

  app.post('/runs/:runId/cancel', jobs.cancel);

  return app;
}
