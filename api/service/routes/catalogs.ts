import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { fitCatalog } from '../../catalog/catalog-fit.ts';
import { catalogFormat } from '../../catalog/catalog-formats.ts';
import { readCatalogText } from '../../catalog/catalog-input.ts';
import {
  catalogEventJson,
  catalogFitJson,
  catalogLoadJson,
  feltJson,
} from '../../catalog/catalog-json.ts';
import type { CatalogLoad } from '../../catalog/catalog-load.ts';
import { feltHistory } from '../../engine/catalog/felt-history.ts';
import { InvalidInput } from '../../engine/errors.ts';
import type { StudyCatalogRecord } from '../../store/catalog-repository.ts';
import { describeValue } from '../../study/fields.ts';
import { FELT_PAIR_BUDGET, FIT_EVENT_BUDGET } from '../../operations/catalog-limits.ts';
import { readCatalogFitRequest, readCatalogUpload } from '../catalog-requests.ts';
import { HttpError, notFound, found } from '../http-error.ts';
import { readJsonObject } from '../request-body.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { storedInputs, validateStudy } from '../../operations/study-input.ts';

/** A stored catalog as the API shows it: where it came from, its load, and links. */
const catalogJson = (record: StudyCatalogRecord, load: CatalogLoad) => ({
  studyId: record.studyId,
  fileName: record.fileName,
  importedAt: record.importedAt,
  ...catalogLoadJson(load),
  links: {
    self: `/api/studies/${record.studyId}/catalog`,
    felt: `/api/studies/${record.studyId}/felt`,
    study: `/api/studies/${record.studyId}`,
  },
});

/** Catalogs: attach one to a saved study, read or detach it, its felt history; stateless fits. */
export function catalogRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  const { store } = ctx;

  const findStudy = (id: string) => found(store.studies.get(id), 'study', id);
  const findCatalog = (id: string): StudyCatalogRecord => {
    findStudy(id);
    const record = store.catalogs.get(id);
    if (!record)
      throw new HttpError(
        404,
        `study "${id}" has no catalog attached; attach one with PUT /api/studies/${id}/catalog`,
      );
    return record;
  };
  // A stored catalog was read before it was written, so it parses (and holds events) again.
  const loadOf = (record: StudyCatalogRecord): CatalogLoad =>
    readCatalogText(record.content, record.format);

  app.put('/studies/:id/catalog', async (c) => {
    const id = c.req.param('id');
    findStudy(id);
    const upload = await readCatalogUpload(c);
    const load = readCatalogText(upload.text, upload.format);
    const put = store.catalogs.put(id, {
      fileName: upload.fileName ?? catalogFormat(load.format).fileName,
      format: load.format,
      content: upload.text,
      loadedCount: load.summary.loaded,
      rejectedCount: load.summary.rejected,
      nonMomentCount: load.summary.nonMoment,
    });
    if (!put) throw notFound('study', id);
    const body = catalogJson(put.catalog, load);
    return put.replaced ? c.json(body, 200) : c.json(body, 201, { Location: body.links.self });
  });

  app.get('/studies/:id/catalog', (c) => {
    const record = findCatalog(c.req.param('id'));
    const load = loadOf(record);
    return c.json({ ...catalogJson(record, load), events: load.events.map(catalogEventJson) });
  });

  app.delete('/studies/:id/catalog', (c) => {
    const id = c.req.param('id');
    findCatalog(id);
    if (!store.catalogs.delete(id))
      throw new HttpError(404, `study "${id}" has no catalog attached`);
    return c.body(null, 204);
  });

  app.get('/studies/:id/felt', (c) => {
    const id = c.req.param('id');
    const record = findCatalog(id);
    const magnitudes = c.req.query('magnitudes');
    if (magnitudes !== undefined && magnitudes !== 'moment' && magnitudes !== 'all') {
      throw new InvalidInput(
        [
          {
            path: 'magnitudes',
            message: `expected "moment" or "all", got ${describeValue(magnitudes)}`,
          },
        ],
        'invalid felt request',
      );
    }
    const inputs = storedInputs(store, findStudy(id), terrainGridsOf(ctx));
    const { study } = validateStudy(inputs.raw, ctx.models, inputs);
    const communityId = c.req.query('community');
    const communities =
      communityId === undefined
        ? study.communities
        : study.communities.filter((x) => x.id === communityId);
    if (communities.length === 0) {
      throw new HttpError(404, `no community "${communityId}" in study "${id}"`, [
        {
          path: 'community',
          message: `expected one of ${study.communities.map((x) => x.id).join(', ')}, got ${describeValue(communityId)}`,
        },
      ]);
    }
    const load = loadOf(record);
    const pairs = load.events.length * communities.length;
    if (pairs > FELT_PAIR_BUDGET) {
      throw new InvalidInput([
        {
          path: 'catalog',
          message: `expected at most ${FELT_PAIR_BUDGET} catalog events × communities for one felt history; got ${load.events.length} × ${communities.length} = ${pairs}. Ask for one community at a time`,
        },
      ]);
    }
    const history = feltHistory({ ...study, communities }, load.events, {
      models: ctx.models,
      ...(magnitudes === 'all' ? { magnitudes } : {}),
    });
    return c.json({
      studyId: id,
      catalog: { fileName: record.fileName, format: record.format, importedAt: record.importedAt },
      ...feltJson(history),
    });
  });

  app.post('/catalog/fit', async (c) => {
    const { value } = await readJsonObject(
      c,
      'a catalog fit request ({ "text": ..., "polygon"?: ..., "mMax"?: ... })',
    );
    const request = readCatalogFitRequest(value);
    const load = readCatalogText(request.text, request.format);
    if (load.events.length > FIT_EVENT_BUDGET) {
      throw new InvalidInput([
        {
          path: 'catalog',
          message: `expected at most ${FIT_EVENT_BUDGET} events for one fit; got ${load.events.length}. Fit a part of the catalog (one region or period) at a time`,
        },
      ]);
    }
    const fit = fitCatalog(load.events, request.options);
    return c.json({ catalog: catalogLoadJson(load), ...catalogFitJson(fit) });
  });

  return app;
}
