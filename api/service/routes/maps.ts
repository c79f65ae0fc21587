import { Hono } from 'hono';
import type { MapRunRecord } from '../../store/index.ts';
import { HttpError, notFound, found } from '../http-error.ts';
import { jobHandlers } from '../job-handlers.ts';
import { readMapRequest } from '../../operations/map-request.ts';
import type { MapRuns } from '../../operations/map-runs.ts';
import { readJsonObject } from '../request-body.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { startMapRun } from '../../operations/start-map-run.ts';

/** A map run as the API shows it: its state, progress, what it maps, and links; the GeoJSON is separate. */
export const mapRunJson = (run: MapRunRecord) => ({
  id: run.id,
  studyId: run.studyId,
  status: run.status,
  progress: run.progress,
  request: run.request,
  map: run.description,
  warnings: run.warnings,
  error: run.error,
  inputHash: run.inputHash,
  provenance: run.provenance === null ? null : (JSON.parse(run.provenance) as unknown),
  createdAt: run.createdAt,
  startedAt: run.startedAt,
  finishedAt: run.finishedAt,
  links: {
    self: `/api/maps/${run.id}`,
    study: `/api/studies/${run.studyId}`,
    geojson: `/api/maps/${run.id}/map.geojson`,
    cancel: `/api/maps/${run.id}/cancel`,
  },
});

/** Hazard maps of saved studies, each a run spread over the run pool and kept in the store with its GeoJSON. */
export function mapRoutes(ctx: ServiceContext & { readonly maps?: MapRuns }): Hono {
  const app = new Hono();
  const { studies, maps } = ctx.store;
  const jobs = jobHandlers(ctx, 'map', mapRunJson);

  app.post('/studies/:id/maps', async (c) => {
    const id = c.req.param('id');
    const record = found(studies.get(id), 'study', id);
    const { value } = await readJsonObject(
      c,
      'a map request ({ "measure": "PGA", "returnPeriodYears": 475, "spacingKm": 10 })',
    );
    const run = await startMapRun(ctx, record, readMapRequest(value));
    if (!run) throw notFound('study', id);
    return c.json(mapRunJson(run), 202, { Location: `/api/maps/${run.id}` });
  });

  app.get('/studies/:id/maps', jobs.list);
  app.get('/maps/:mapId', jobs.one);

  app.get('/maps/:mapId/map.geojson', (c) => {
    const run = jobs.find(c.req.param('mapId'));
    const text = maps.geojson(run.id);
    if (run.status !== 'done' || text === undefined)
      throw new HttpError(
        409,
        `map "${run.id}" is ${run.status}; its GeoJSON exists only once it is done${run.error ? ` (${run.error})` : ''}`,
      );
    return c.body(text, 200, {
      'Content-Type': 'application/geo+json; charset=utf-8',
      'Content-Disposition': `attachment; filename="tremora-map-${run.id}.geojson"`,
    });
  });

  app.post('/maps/:mapId/cancel', jobs.cancel);

  return app;
}
