import { Hono } from 'hono';
import { StudyTooLarge } from '../../engine/errors.ts';
import { frameForStudy } from '../../engine/geometry/projection.ts';
import { mapGrid } from '../../engine/map/map-grid.ts';
import type { Study } from '../../engine/model.ts';
import { HttpError, notFound } from '../http-error.ts';
import { readMapRequest } from '../map-request.ts';
import { MapRuns, type MapRun } from '../map-runs.ts';
import { readJsonObject } from '../request-body.ts';
import type { ServiceContext } from '../service-context.ts';
import { storedInputs, validateStudy } from '../study-input.ts';
import type { MapRequest } from '../../workers/messages.ts';

/** A map run as the API shows it: its state, progress, what it maps, and links; the GeoJSON is separate. */
export const mapRunJson = (run: MapRun) => ({
  id: run.id,
  studyId: run.studyId,
  status: run.status,
  progress: run.progress,
  request: run.request,
  map: run.description,
  warnings: run.summary?.warnings ?? [],
  error: run.error,
  createdAt: run.createdAt,
  finishedAt: run.finishedAt,
  links: { self: `/api/maps/${run.id}`, study: `/api/studies/${run.studyId}`, geojson: `/api/maps/${run.id}/map.geojson`, cancel: `/api/maps/${run.id}/cancel` },
});

/**
 * Terms a map sums per point and rupture, for the work budget (work-budget.ts counts
 * communities × ruptures × levels): one level for a chance map; for a return-period map the
 * levels its search reads, about log₂ of the curve's 25 levels and two more.
 */
const MAP_LEVELS_READ = { 'return-period': 7, chance: 1 } as const;

/** Hazard maps of saved studies, each a run spread over the run pool with its progress in its status. */
export function mapRoutes(ctx: ServiceContext & { readonly maps?: MapRuns }): Hono {
  const app = new Hono();
  const maps = ctx.maps ?? new MapRuns();

  const findMap = (id: string): MapRun => {
    const run = maps.get(id);
    if (!run) throw notFound('map', id);
    return run;
  };

  const checkBudget = async (study: Study, request: MapRequest): Promise<void> => {
    const { ruptures } = await ctx.quickPool.run({ kind: 'measure', study }).result;
    const grid = mapGrid(study, frameForStudy(study), { spacingKm: request.spacingKm, ...(request.bounds ? { bounds: request.bounds } : {}) });
    const levels = MAP_LEVELS_READ[request.quantity.kind];
    const size = grid.count * ruptures * levels;
    if (size > ctx.workBudget) throw new StudyTooLarge(size, ctx.workBudget, `${grid.count} map points x ${ruptures} ruptures x ${levels} levels read`);
  };

  app.post('/studies/:id/maps', async (c) => {
    const id = c.req.param('id');
    const record = ctx.store.studies.get(id);
    if (!record) throw notFound('study', id);
    const { value } = await readJsonObject(c, 'a map request ({ "measure": "PGA", "returnPeriodYears": 475, "spacingKm": 10 })');
    const request = readMapRequest(value);
    const inputs = storedInputs(ctx.store, record);
    const { study } = validateStudy(inputs.raw, ctx.models, inputs.communitiesCsv);
    await checkBudget(study, request);
    const run = maps.start(ctx.runPool, id, study, request);
    return c.json(mapRunJson(run), 202, { Location: `/api/maps/${run.id}` });
  });

  app.get('/studies/:id/maps', (c) => {
    const id = c.req.param('id');
    if (!ctx.store.studies.get(id)) throw notFound('study', id);
    return c.json({ maps: maps.listForStudy(id).map(mapRunJson) });
  });

  app.get('/maps/:mapId', (c) => c.json(mapRunJson(findMap(c.req.param('mapId')))));

  app.get('/maps/:mapId/map.geojson', (c) => {
    const run = findMap(c.req.param('mapId'));
    if (run.status !== 'done') throw new HttpError(409, `map "${run.id}" is ${run.status}; its GeoJSON exists only once it is done${run.error ? ` (${run.error})` : ''}`);
    return c.body(run.geojson.join(''), 200, {
      'Content-Type': 'application/geo+json; charset=utf-8',
      'Content-Disposition': `attachment; filename="tremora-map-${run.id}.geojson"`,
    });
  });

  app.post('/maps/:mapId/cancel', (c) => {
    const run = findMap(c.req.param('mapId'));
    if (run.status !== 'running') throw new HttpError(409, `map "${run.id}" is already ${run.status}; only a running map can be cancelled`);
    maps.cancel(run.id);
    return c.json(mapRunJson(run), 202);
  });

  return app;
}
