import type { Context, Hono } from 'hono';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { Community } from '../../api/engine/model.ts';
import {
  COMMUNITY_COLUMNS,
  type ColumnChoice,
} from '../../api/study/community-files/column-names.ts';
import { applyCommunitiesFile, readCommunitiesFile } from '../data/community-import.ts';
import { readStudy, type StudyData } from '../data/study-data.ts';
import {
  communityList,
  importSourcesGeoJson,
  issueField,
  removeCommunity,
  saveCommunity,
  type CommunityForm,
  type EditOutcome,
} from '../data/study-edits.ts';
import { CommunityFormView } from '../views/community-form-view.tsx';
import { EditorView } from '../views/editor-view.tsx';
import type { UploadProblem } from '../views/upload-section.tsx';
import { field, fileField, type PageKit, uploadedOrCarried } from './page-kit.ts';
import { faultImportPages } from './fault-import-pages.tsx';
import { motionPages } from './motion-pages.tsx';
import { sourcePages } from './source-pages.tsx';
import { studyNotFoundPage, invalidStudyPage } from './message-pages.tsx';
import { editorFormProps, issuesByField } from './page-kit.ts';

const EMPTY_FORM: CommunityForm = {
  id: '',
  name: '',
  lon: '',
  lat: '',
  vs30: '',
  siteClass: '',
  population: '',
  elevationM: '',
  coastal: false,
};

const formOf = (c: Community): CommunityForm => ({
  id: c.id,
  name: c.name,
  lon: String(c.lon),
  lat: String(c.lat),
  vs30: c.vs30Basis === 'measured' ? String(c.vs30) : '',
  siteClass: c.siteClass ?? '',
  population: c.population === undefined ? '' : String(c.population),
  elevationM: c.elevationM === undefined ? '' : String(c.elevationM),
  coastal: c.coastal,
});

type Form = Record<string, string | File | (string | File)[]>;

const postedForm = (form: Form): CommunityForm => ({
  id: field(form, 'id') ?? '',
  name: field(form, 'name') ?? '',
  lon: field(form, 'lon') ?? '',
  lat: field(form, 'lat') ?? '',
  vs30: field(form, 'vs30') ?? '',
  siteClass: field(form, 'siteClass') ?? '',
  population: field(form, 'population') ?? '',
  elevationM: field(form, 'elevationM') ?? '',
  coastal: field(form, 'coastal') === 'true',
});

/**
 * The study editor. Every change builds the whole candidate document and validates it
 * (data/study-edits.ts); only a valid one is written, then the browser is sent back to the
 * editor (303, so a reload does not post again). Problems come back on the same page, next
 * to the field or upload they concern, with status 422.
 */
export function editorPages(app: Hono, kit: PageKit): void {
  const { ctx } = kit;

  const load = (
    c: Context,
  ): { data: StudyData & { ok: true } } | { response: Response | Promise<Response> } => {
    const data = readStudy(ctx, c.req.param('id') as string, { drafts: true });
    if (!data) return { response: studyNotFoundPage(kit, c) };
    if (!data.ok) return { response: invalidStudyPage(kit, c, data) };
    return { data };
  };

  const write = (data: StudyData & { ok: true }, outcome: EditOutcome & { ok: true }) =>
    ctx.store.studies.replace(data.record.id, {
      name: outcome.name,
      document: JSON.stringify(outcome.document, null, 2),
      ...(outcome.file ? { file: outcome.file } : {}),
    });

  /**
   * Reads the study again once the posted body has arrived and runs `edit` on it in one
   * transaction with its write: a save made while the body was on its way is built upon, not lost.
   */
  const afterBody = (
    c: Context,
    edit: (data: StudyData & { ok: true }) => Response | Promise<Response>,
  ): Response | Promise<Response> => {
    // A transaction's function may not return a promise (better-sqlite3), and a page rendered
    // asynchronously is one; the answer is kept aside and returned once the write is committed.
    let answer: Response | Promise<Response> | undefined;
    ctx.store.transaction(() => {
      const fresh = load(c);
      answer = 'response' in fresh ? fresh.response : edit(fresh.data);
    });
    return answer as Response | Promise<Response>;
  };

  const editor = (
    c: Context,
    data: StudyData & { ok: true },
    extra: { problem?: UploadProblem; notice?: readonly InputIssue[] } = {},
  ) => {
    const saved = c.req.query('saved') === '1';
    return kit.render(
      c,
      <EditorView
        page={kit.page(c)}
        studyId={data.record.id}
        study={data.study}
        missing={data.missing}
        saved={saved}
        {...extra}
      />,
      extra.problem || extra.notice ? 422 : 200,
    );
  };

  const communityForm = (
    c: Context,
    data: StudyData & { ok: true },
    index: number | undefined,
    values: CommunityForm,
    issues: readonly InputIssue[],
  ) => {
    const at = index ?? communityList(data.inputs, data.study.communities).length;
    const split = issuesByField(issues, (path) => {
      const name = issueField(path, at);
      return name && name !== '(row)' && name in EMPTY_FORM ? name : undefined;
    });
    const existing = index === undefined ? undefined : data.study.communities[index];
    const form = { existing, folder: 'communities', newPath: 'new-community', issues: split };
    return kit.render(
      c,
      <CommunityFormView {...editorFormProps(kit, c, data, form)} values={values} />,
      issues.length > 0 ? 422 : 200,
    );
  };

  const indexOf = (data: StudyData & { ok: true }, communityId: string) =>
    data.study.communities.findIndex((x) => x.id === communityId);

  app.get('/studies/:id/edit', (c) => {
    const loaded = load(c);
    return 'response' in loaded ? loaded.response : editor(c, loaded.data);
  });

  app.get('/studies/:id/edit/new-community', (c) => {
    const loaded = load(c);
    return 'response' in loaded
      ? loaded.response
      : communityForm(c, loaded.data, undefined, EMPTY_FORM, []);
  });

  /**
   * Saves the posted community, a new one when `communityId` is undefined, and goes back to the
   * editor; the form again with its problems when the study would not be valid.
   */
  const postCommunity = async (c: Context, communityId: string | undefined) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const values = postedForm(await c.req.parseBody());
    return afterBody(c, (data) => {
      const index = communityId === undefined ? undefined : indexOf(data, communityId);
      if (index !== undefined && index < 0)
        return c.redirect(`/studies/${data.record.id}/edit`, 303);
      const outcome = saveCommunity(data.inputs, data.study.communities, values, index, ctx.models);
      if (!outcome.ok) return communityForm(c, data, index, values, outcome.issues);
      write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1`, 303);
    });
  };

  app.post('/studies/:id/edit/new-community', (c) => postCommunity(c, undefined));

  app.get('/studies/:id/edit/communities/:cid', (c) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const index = indexOf(loaded.data, c.req.param('cid'));
    const community = loaded.data.study.communities[index];
    if (!community) return c.redirect(`/studies/${loaded.data.record.id}/edit`, 303);
    return communityForm(c, loaded.data, index, formOf(community), []);
  });

  app.post('/studies/:id/edit/communities/:cid', (c) => postCommunity(c, c.req.param('cid')));

  app.post('/studies/:id/edit/communities/:cid/remove', (c) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const index = indexOf(loaded.data, c.req.param('cid'));
    if (index < 0) return c.redirect(`/studies/${loaded.data.record.id}/edit`, 303);
    const outcome = removeCommunity(
      loaded.data.inputs,
      loaded.data.study.communities,
      index,
      ctx.models,
    );
    if (!outcome.ok) return editor(c, loaded.data, { notice: outcome.issues });
    write(loaded.data, outcome);
    return c.redirect(`/studies/${loaded.data.record.id}/edit?saved=1`, 303);
  });

  const upload = (kind: 'sources') => async (c: Context) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const tr = kit.tr(c);
    const file = fileField(await c.req.parseBody(), 'file');
    if (!file)
      return editor(c, loaded.data, {
        problem: {
          upload: kind,
          issues: [{ path: '(file)', message: tr.t('editor.upload.noFile') }],
        },
      });
    const text = await file.text();
    return afterBody(c, (data) => {
      const outcome = importSourcesGeoJson(data.inputs, text, ctx.models);
      if (!outcome.ok)
        return editor(c, data, { problem: { upload: kind, issues: outcome.issues, text } });
      write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1`, 303);
    });
  };

  // A communities file of any accepted format; the column choice form posts here too, with the
  // file carried back (fileName, fileData in base64) or chosen again.
  app.post('/studies/:id/edit/communities-csv', async (c) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const tr = kit.tr(c);
    const form = await c.req.parseBody();
    const upload = await uploadedOrCarried(form);
    if (!upload)
      return editor(c, loaded.data, {
        problem: {
          upload: 'communities',
          issues: [{ path: '(file)', message: tr.t('editor.upload.noFile') }],
        },
      });
    const choice: ColumnChoice = {};
    for (const key of COMMUNITY_COLUMNS) {
      const column = field(form, `column.${key}`);
      if (column) choice[key] = column;
    }
    const read = await readCommunitiesFile(upload.bytes, upload.name, choice);
    // Applied to the study as read after the file has arrived, in one transaction with the write.
    return afterBody(c, (data) => {
      const outcome = applyCommunitiesFile(data.inputs, read, ctx.models);
      if (!outcome.ok)
        return editor(c, data, {
          problem: {
            upload: 'communities',
            issues: outcome.issues,
            ...(outcome.text !== undefined ? { text: outcome.text } : {}),
            ...(outcome.pick ? { pick: outcome.pick } : {}),
          },
        });
      write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1`, 303);
    });
  });
  app.post('/studies/:id/edit/sources-geojson', upload('sources'));

  const steps = {
    load,
    afterBody,
    write: (data: StudyData & { ok: true }, outcome: EditOutcome & { ok: true }) =>
      void write(data, outcome),
    editorWithNotice: (c: Context, data: StudyData & { ok: true }, notice: readonly InputIssue[]) =>
      editor(c, data, { notice }),
  };
  sourcePages(app, kit, steps);
  faultImportPages(app, kit, steps);
  motionPages(app, kit, steps);
}
