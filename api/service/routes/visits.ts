import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { visitCsv } from '../../results/visit-csv.ts';
import type { VisitRecord } from '../../store/visit-repository.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { storedInputs, validateStudy } from '../../operations/study-input.ts';
import { readVisit } from '../../operations/visit-input.ts';
import { HttpError, notFound, found } from '../http-error.ts';
import { readJsonObject } from '../request-body.ts';

const visitJson = (v: VisitRecord) => ({
  ...v,
  links: {
    self: `/api/studies/${v.studyId}/visits/${v.id}`,
    study: `/api/studies/${v.studyId}`,
  },
});

/** Awareness visits to a study's communities: list, record, delete, and a CSV of them all. */
export function visitRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  const { store } = ctx;

  const findStudy = (id: string) => {
    const record = found(store.studies.get(id), 'study', id);
    const inputs = storedInputs(store, record, terrainGridsOf(ctx));
    return validateStudy(inputs.raw, ctx.models, inputs).study;
  };

  app.get('/studies/:id/visits', (c) => {
    const id = c.req.param('id');
    findStudy(id);
    const community = c.req.query('community');
    const visits = store.visits.list(id, community || undefined);
    return c.json({ studyId: id, count: visits.length, visits: visits.map(visitJson) });
  });

  app.post('/studies/:id/visits', async (c) => {
    const id = c.req.param('id');
    const study = findStudy(id);
    const { value } = await readJsonObject(c, 'a visit');
    const added = store.visits.add(id, readVisit(value, study));
    if (!added) throw notFound('study', id);
    const body = visitJson(added);
    return c.json(body, 201, { Location: body.links.self });
  });

  app.delete('/studies/:id/visits/:visitId', (c) => {
    const id = c.req.param('id');
    findStudy(id);
    const visitId = c.req.param('visitId');
    if (!store.visits.delete(id, visitId))
      throw new HttpError(404, `study "${id}" has no visit "${visitId}"`);
    return c.body(null, 204);
  });

  app.get('/studies/:id/visits.csv', (c) => {
    const id = c.req.param('id');
    const study = findStudy(id);
    const names = new Map(study.communities.map((x) => [x.id, x.name]));
    return c.body(visitCsv(store.visits.list(id), names), 200, {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="tremora-visits-${id}.csv"`,
    });
  });

  return app;
}
