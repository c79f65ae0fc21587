import { Hono, type Context } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import type { StudySummary } from '../../store/index.ts';
import { notFound, found } from '../http-error.ts';
import { readJsonObject } from '../request-body.ts';
import {
  deleteStudy,
  duplicateStudy,
  readNameBody,
  renameStudy,
} from '../../operations/study-records.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { storedInputs, validateStudy, terrainFiles } from '../../operations/study-input.ts';

/** Where a study's parts and actions are. */
export const studyLinks = (id: string) => ({
  self: `/api/studies/${id}`,
  document: `/api/studies/${id}/document`,
  runs: `/api/studies/${id}/runs`,
  communities: `/api/studies/${id}/communities`,
  sources: `/api/studies/${id}/sources`,
  scenario: `/api/studies/${id}/scenario`,
});

/** A study as lists and writes answer it (the document itself comes with GET /api/studies/{id}). */
export const studyJson = (study: StudySummary) => ({
  id: study.id,
  name: study.name,
  createdAt: study.createdAt,
  updatedAt: study.updatedAt,
  links: studyLinks(study.id),
});

/** Saved studies: list, create, read, replace, delete. Documents are kept as they were sent. */
export function studyRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  const { studies } = ctx.store;

  const find = (id: string) => found(studies.get(id), 'study', id);

  app.get('/studies', (c) => c.json({ studies: studies.list().map(studyJson) }));

  app.post('/studies', async (c) => {
    const { value, text } = await readJsonObject(c, 'a study document');
    await terrainGridsOf(ctx).prepare(value);
    const { study, warnings } = validateStudy(
      value,
      ctx.models,
      terrainFiles(value, terrainGridsOf(ctx)),
    );
    const record = studies.create({ name: study.name, document: text });
    return c.json({ ...studyJson(record), warnings }, 201, {
      Location: `/api/studies/${record.id}`,
    });
  });

  app.get('/studies/:id', (c) => {
    const record = find(c.req.param('id'));
    const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
    return c.json({
      ...studyJson(record),
      document: inputs.raw,
      communitiesCsv: inputs.communitiesCsv ?? null,
    });
  });

  app.get('/studies/:id/document', (c) => {
    const record = find(c.req.param('id'));
    return c.body(record.document, 200, { 'Content-Type': 'application/json; charset=utf-8' });
  });

  app.put('/studies/:id', async (c) => {
    const id = c.req.param('id');
    const existing = find(id);
    const { value, text } = await readJsonObject(c, 'a study document');
    const csv =
      typeof value.communities === 'string'
        ? studies.latestFile(existing.id, 'communities-csv')
        : undefined;
    await terrainGridsOf(ctx).prepare(value);
    const { study, warnings } = validateStudy(value, ctx.models, {
      communitiesCsv: csv,
      ...terrainFiles(value, terrainGridsOf(ctx)),
    });
    const record = studies.replace(id, { name: study.name, document: text });
    if (!record) throw notFound('study', id);
    return c.json({ ...studyJson(record), warnings });
  });

  app.delete('/studies/:id', (c) => {
    const id = c.req.param('id');
    if (!deleteStudy(ctx, id)) throw notFound('study', id);
    return c.body(null, 204);
  });

  /**
   * Reads `{ name }` (`what` says which name is asked for) and gives it to `change` for study
   * `id`; 404 when the study is gone, before the body is read or by the time it is written.
   */
  const withName = async (
    c: Context,
    id: string,
    what: string,
    change: (ctx: ServiceContext, id: string, name: string) => StudySummary | undefined,
  ) => {
    find(id);
    const { value } = await readJsonObject(c, what);
    return found(change(ctx, id, readNameBody(value)), 'study', id);
  };

  // A copy under a new name (`{ name }`): the document and its communities file, not its runs.
  app.post('/studies/:id/duplicate', async (c) => {
    const id = c.req.param('id');
    const record = await withName(c, id, 'an object with the name of the copy', duplicateStudy);
    return c.json(studyJson(record), 201, { Location: `/api/studies/${record.id}` });
  });

  // A new name (`{ name }`), written into the document in the transaction that reads it.
  app.post('/studies/:id/rename', async (c) => {
    const id = c.req.param('id');
    return c.json(studyJson(await withName(c, id, 'an object with the new name', renameStudy)));
  });

  return app;
}
