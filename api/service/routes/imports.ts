import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { notFound, found } from '../http-error.ts';
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
import type { StudyFile, StudyRecord } from '../../store/study-repository.ts';

/**
 * Imports into a saved study: a communities CSV or a GeoJSON FeatureCollection of sources
 * replaces the study's communities or sources. The whole study is validated with the import
 * before anything is written; on any problem nothing changes.
 */
export function importRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  const { studies } = ctx.store;

  const find = (id: string) => found(studies.get(id), 'study', id);

  /**
   * Replaces study `id` by what `rebuild` makes of the stored one, in the transaction of
   * studies.update, and answers with the saved study, what `imported` counts and the warnings.
   */
  const saveImport = (
    id: string,
    rebuild: (record: StudyRecord) => { document: object; outcome: ValidStudy; file: StudyFile },
    imported: (study: ValidStudy['study']) => Record<string, number>,
  ) => {
    let outcome: ValidStudy | undefined;
    const updated = studies.update(id, (record) => {
      const next = rebuild(record);
      outcome = next.outcome;
      return {
        name: outcome.study.name,
        document: JSON.stringify(next.document, null, 2),
        file: next.file,
      };
    });
    if (!updated || !outcome) throw notFound('study', id);
    return {
      ...studyJson(updated),
      imported: imported(outcome.study),
      warnings: outcome.warnings,
    };
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
    const saved = saveImport(
      id,
      (record) => {
        const document = {
          ...storedInputs(ctx.store, record, terrainGridsOf(ctx)).raw,
          communities: IMPORTED_COMMUNITIES_FILE,
        };
        const outcome = validateStudy(document, ctx.models, {
          communitiesCsv: csv,
          ...terrainFiles(document, terrainGridsOf(ctx)),
        });
        return { document, outcome, file: { kind: 'communities-csv', content: csv } };
      },
      (study) => ({ communities: study.communities.length }),
    );
    return c.json(saved);
  });

  app.post('/studies/:id/sources', async (c) => {
    const id = find(c.req.param('id')).id;
    const { value, text } = await readJsonObject(
      c,
      'a GeoJSON FeatureCollection of sources',
      GEOJSON_TYPES,
    );
    const saved = saveImport(
      id,
      (record) => {
        const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
        const document = { ...inputs.raw, sources: value };
        const outcome = validateStudy(document, ctx.models, inputs);
        return { document, outcome, file: { kind: 'sources-geojson', content: text } };
      },
      (study) => ({ sources: study.sources.length }),
    );
    return c.json(saved);
  });

  return app;
}
