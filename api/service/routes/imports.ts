import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { notFound } from '../http-error.ts';
import { CSV_TYPES, GEOJSON_TYPES, readJsonObject, readText } from '../request-body.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import {
  storedInputs,
  validateStudy,
  type ValidStudy,
  terrainFiles,
} from '../../operations/study-input.ts';
import { IMPORTED_COMMUNITIES_FILE } from '../../operations/study-records.ts';
import { studyJson } from './studies.ts';

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

  // The study is read for the import only once the body has arrived, in the transaction that
  // writes it (studies.update), so a save made while the body was on its way is not lost.
  app.post('/studies/:id/communities', async (c) => {
    const id = find(c.req.param('id')).id;
    const csv = await readText(
      c,
      CSV_TYPES,
      'a communities CSV (header id,name,lon,lat,vs30,population,coastal,elevationM)',
    );
    let outcome: ValidStudy | undefined;
    const updated = studies.update(id, (record) => {
      const document = {
        ...storedInputs(ctx.store, record, terrainGridsOf(ctx)).raw,
        communities: IMPORTED_COMMUNITIES_FILE,
      };
      outcome = validateStudy(document, ctx.models, {
        communitiesCsv: csv,
        ...terrainFiles(document, terrainGridsOf(ctx)),
      });
      return {
        name: outcome.study.name,
        document: JSON.stringify(document, null, 2),
        file: { kind: 'communities-csv', content: csv },
      };
    });
    if (!updated || !outcome) throw notFound('study', id);
    return c.json({
      ...studyJson(updated),
      imported: { communities: outcome.study.communities.length },
      warnings: outcome.warnings,
    });
  });

  app.post('/studies/:id/sources', async (c) => {
    const id = find(c.req.param('id')).id;
    const { value, text } = await readJsonObject(
      c,
      'a GeoJSON FeatureCollection of sources',
      GEOJSON_TYPES,
    );
    let outcome: ValidStudy | undefined;
    const updated = studies.update(id, (record) => {
      const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
      const document = { ...inputs.raw, sources: value };
      outcome = validateStudy(document, ctx.models, inputs);
      return {
        name: outcome.study.name,
        document: JSON.stringify(document, null, 2),
        file: { kind: 'sources-geojson', content: text },
      };
    });
    if (!updated || !outcome) throw notFound('study', id);
    return c.json({
      ...studyJson(updated),
      imported: { sources: outcome.study.sources.length },
      warnings: outcome.warnings,
    });
  });

  return app;
}
