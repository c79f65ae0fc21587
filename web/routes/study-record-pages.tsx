import type { Context, Hono } from 'hono';
import { InvalidInput, type InputIssue } from '../../api/engine/errors.ts';
import {
  createStudy,
  deleteStudy,
  duplicateStudy,
  readStudyName,
  renameStudy,
  studyDependents,
} from '../../api/operations/study-records.ts';
import {
  COMMUNITY_COLUMNS,
  type ColumnChoice,
} from '../../api/study/community-files/column-names.ts';
import { readCommunitiesFile } from '../data/community-import.ts';
import { DeleteStudyView } from '../views/delete-study-view.tsx';
import { StudyFormView, type StudyFormViewProps } from '../views/study-form-view.tsx';
import { field, fileField, type PageKit } from './page-kit.ts';
import { studyNotFoundPage } from './message-pages.tsx';

type Form = Record<string, string | File | (string | File)[]>;

/** The issues of an InvalidInput split into the name's and the rest (the village file's). */
function splitIssues(issues: readonly InputIssue[]) {
  return {
    nameIssues: issues.filter((i) => i.path === 'name'),
    fileIssues: issues.filter((i) => i.path !== 'name'),
  };
}

/** Runs `work`; an InvalidInput comes back as its issues instead of being thrown. */
function attempt<T>(
  work: () => T,
): { ok: true; value: T } | { ok: false; issues: readonly InputIssue[] } {
  try {
    return { ok: true, value: work() };
  } catch (error) {
    if (error instanceof InvalidInput) return { ok: false, issues: error.issues };
    throw error;
  }
}

/** The village file of a new study's form: sent now, or carried back by the column choice. */
async function postedFile(form: Form) {
  const file = fileField(form, 'file');
  if (file) return { bytes: new Uint8Array(await file.arrayBuffer()), name: file.name };
  const carried = field(form, 'fileData');
  const carriedName = field(form, 'fileName');
  return carried && carriedName
    ? { bytes: new Uint8Array(Buffer.from(carried, 'base64')), name: carriedName }
    : undefined;
}

/**
 * New study, rename, copy and delete, from the pages. The work is in
 * api/operations/study-records.ts (the API calls the same); each write validates what it writes
 * and reads the study in the transaction that writes it.
 */
export function studyRecordPages(app: Hono, kit: PageKit): void {
  const { ctx } = kit;

  const form = (c: Context, props: Omit<StudyFormViewProps, 'page'>, status: 200 | 422 = 200) =>
    kit.render(c, <StudyFormView page={kit.page(c)} {...props} />, status);

  const notFound = (c: Context) => studyNotFoundPage(kit, c);

  app.get('/studies/new', (c) => form(c, { kind: 'new', action: '/studies/new', name: '' }));

  app.post('/studies/new', async (c) => {
    const posted = await c.req.parseBody();
    const name = field(posted, 'name') ?? '';
    const again = { kind: 'new', action: '/studies/new', name } as const;
    const named = attempt(() => readStudyName(name));
    const upload = await postedFile(posted);
    let communitiesCsv: string | undefined;
    if (upload) {
      const choice: ColumnChoice = {};
      for (const key of COMMUNITY_COLUMNS) {
        const column = field(posted, `column.${key}`);
        if (column) choice[key] = column;
      }
      const read = await readCommunitiesFile(upload.bytes, upload.name, choice);
      if (!read.ok)
        return form(
          c,
          {
            ...again,
            fileIssues: read.issues,
            ...(named.ok ? {} : { nameIssues: named.issues }),
            ...(read.pick ? { pick: read.pick } : {}),
          },
          422,
        );
      communitiesCsv = read.csvText;
    }
    const created = attempt(() =>
      createStudy(ctx, {
        name,
        ...(communitiesCsv === undefined ? {} : { communitiesCsv }),
      }),
    );
    if (!created.ok) return form(c, { ...again, ...splitIssues(created.issues) }, 422);
    return c.redirect(`/studies/${created.value.id}/edit`, 303);
  });

  /**
   * The rename and duplicate forms of the study of the path: `named` is the name the form
   * starts with; a post applies `write` (undefined when there is no such study) and goes to
   * the study it wrote, or shows the form again with the name's problems.
   */
  const nameForm = (
    kind: 'rename' | 'duplicate',
    named: (c: Context, name: string) => string,
    write: (id: string, name: string) => { readonly id: string } | undefined,
  ) => {
    app.get(`/studies/:id/${kind}`, (c) => {
      const record = ctx.store.studies.get(c.req.param('id'));
      if (!record) return notFound(c);
      const study = { id: record.id, name: record.name };
      const action = `/studies/${record.id}/${kind}`;
      return form(c, { kind, action, study, name: named(c, record.name) });
    });

    app.post(`/studies/:id/${kind}`, async (c) => {
      const id = c.req.param('id');
      const name = field(await c.req.parseBody(), 'name') ?? '';
      const written = attempt(() => write(id, readStudyName(name)));
      if (written.ok && !written.value) return notFound(c);
      if (!written.ok) {
        const record = ctx.store.studies.get(id);
        if (!record) return notFound(c);
        const study = { id, name: record.name };
        const again = { kind, action: `/studies/${id}/${kind}`, study, name };
        return form(c, { ...again, ...splitIssues(written.issues) }, 422);
      }
      return c.redirect(`/studies/${written.value?.id}`, 303);
    });
  };

  nameForm(
    'rename',
    (_c, name) => name,
    (id, name) => renameStudy(ctx, id, name),
  );
  nameForm(
    'duplicate',
    (c, name) => kit.tr(c).t('duplicateStudy.name', { name }),
    (id, name) => duplicateStudy(ctx, id, name),
  );

  app.get('/studies/:id/delete', (c) => {
    const record = ctx.store.studies.get(c.req.param('id'));
    const dependents = record && studyDependents(ctx, record.id);
    if (!record || !dependents) return notFound(c);
    return kit.render(
      c,
      <DeleteStudyView
        page={kit.page(c)}
        study={{ id: record.id, name: record.name }}
        dependents={dependents}
      />,
    );
  });

  app.post('/studies/:id/delete', (c) => {
    const record = ctx.store.studies.get(c.req.param('id'));
    if (!record || !deleteStudy(ctx, record.id)) return notFound(c);
    return c.redirect('/?deleted=1', 303);
  });
}
