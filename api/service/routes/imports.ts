import { Hono } from 'hono';
import { notFound } from '../http-error.ts';
import { CSV_TYPES, GEOJSON_TYPES, readJsonObject, readText } from '../request-body.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { storedInputs, validateStudy } from '../../operations/study-input.ts';
import { studyJson } from './studies.ts';

/**
 * What an imported CSV is called in the study document (DESIGN.md section 2 lets `communities`
 * name a CSV file); the CSV itself is kept in the store beside the study.
 */
export const IMPORTED_COMMUNITIES_FILE = 'communities.csv';

/**
 * Imports into a saved study: a communities CSV or a GeoJSON FeatureCollection of sources
 * replaces the study's communities or sources. The whole study is validated with the import
 * before anything is written; on any problem nothing changes.
 */
export function importRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  const { studies } = ctx.store;

  const find = (id: string) => {
    const record = studies.get(id);
    if (!record) throw notFound('study', id);
    return record;
  };

  app.post('/studies/:id/communities', async (c) => {
    const record = find(c.req.param('id'));
    const csv = await readText(c, CSV_TYPES, 'a communities CSV (header id,name,lon,lat,vs30,population,coastal,elevationM)');
    const document = { ...storedInputs(ctx.store, record).raw, communities: IMPORTED_COMMUNITIES_FILE };
    const { study, warnings } = validateStudy(document, ctx.models, csv);
    const updated = studies.replace(record.id, {
      name: study.name,
      document: JSON.stringify(document, null, 2),
      file: { kind: 'communities-csv', content: csv },
    });
    if (!updated) throw notFound('study', record.id);
    return c.json({ ...studyJson(updated), imported: { communities: study.communities.length }, warnings });
  });

  app.post('/studies/:id/sources', async (c) => {
    const record = find(c.req.param('id'));
    const { value, text } = await readJsonObject(c, 'a GeoJSON FeatureCollection of sources', GEOJSON_TYPES);
    const inputs = storedInputs(ctx.store, record);
    const document = { ...inputs.raw, sources: value };
    const { study, warnings } = validateStudy(document, ctx.models, inputs.communitiesCsv);
    const updated = studies.replace(record.id, {
      name: study.name,
      document: JSON.stringify(document, null, 2),
      file: { kind: 'sources-geojson', content: text },
    });
    if (!updated) throw notFound('study', record.id);
    return c.json({ ...studyJson(updated), imported: { sources: study.sources.length }, warnings });
  });

  return app;
}
