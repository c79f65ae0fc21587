import type { Context, Hono } from 'hono';
import type { InputIssue } from '../../api/engine/errors.ts';
import {
  formOfFeature,
  SOURCE_TEXT_FIELDS,
  sourceIssueField,
  type CoordinateOrder,
  type SourceForm,
  type SourceKind,
} from '../data/source-form.ts';
import type { StudyData } from '../data/study-data.ts';
import { removeSource, saveSource, sourceFeatures, type EditOutcome } from '../data/study-edits.ts';
import { SourceFormView } from '../views/source-form-view.tsx';
import { field, type PageKit } from './page-kit.ts';
import { editorFormProps, issuesByField } from './page-kit.ts';

type Editable = StudyData & { ok: true };
type Answer = Response | Promise<Response>;

/** The editor's own helpers (editor-pages.tsx): load a study, edit it after the body, write it. */
export interface EditorSteps {
  load(c: Context): { data: Editable } | { response: Answer };
  afterBody(c: Context, edit: (data: Editable) => Answer): Answer;
  write(data: Editable, outcome: EditOutcome & { ok: true }): void;
  editorWithNotice(c: Context, data: Editable, notice: readonly InputIssue[]): Answer;
}

const EMPTY_SOURCE: SourceForm = {
  ...(Object.fromEntries(SOURCE_TEXT_FIELDS.map((k) => [k, ''])) as Record<
    (typeof SOURCE_TEXT_FIELDS)[number],
    string
  >),
  kind: 'fault',
  order: 'auto',
  coordinates: '',
  setting: 'crustal',
  mechanism: 'strike-slip',
  'recurrence.type': 'gutenberg-richter',
};

type Form = Record<string, string | File | (string | File)[]>;

const KINDS: readonly SourceKind[] = ['fault', 'zone', 'point'];
const ORDERS: readonly CoordinateOrder[] = ['auto', 'lon-lat', 'lat-lon'];

function postedSource(form: Form): SourceForm {
  const kind = field(form, 'kind') as SourceKind;
  const order = field(form, 'order') as CoordinateOrder;
  return {
    ...(Object.fromEntries(SOURCE_TEXT_FIELDS.map((k) => [k, field(form, k) ?? ''])) as Record<
      (typeof SOURCE_TEXT_FIELDS)[number],
      string
    >),
    kind: KINDS.includes(kind) ? kind : 'fault',
    order: ORDERS.includes(order) ? order : 'auto',
    coordinates: field(form, 'coordinates') ?? '',
  };
}

/**
 * One source at a time in the editor: add, edit, remove. The form's source replaces only its
 * own feature; the whole study is validated before anything is written (study-edits.ts).
 */
export function sourcePages(app: Hono, kit: PageKit, steps: EditorSteps): void {
  const { ctx } = kit;

  const indexOf = (data: Editable, sourceId: string) =>
    sourceFeatures(data.inputs).findIndex(
      (f) => (f as { properties?: { id?: unknown } }).properties?.id === sourceId,
    );

  const sourceForm = (
    c: Context,
    data: Editable,
    index: number | undefined,
    values: SourceForm,
    issues: readonly InputIssue[],
  ) => {
    const at = index ?? sourceFeatures(data.inputs).length;
    const split = issuesByField(issues, (path) => {
      const name = sourceIssueField(path, at);
      return name && (name in EMPTY_SOURCE || name === 'coordinates') ? name : undefined;
    });
    const existing = index === undefined ? undefined : data.study.sources[index];
    const form = { existing, folder: 'sources', newPath: 'new-source', issues: split };
    return kit.render(
      c,
      <SourceFormView {...editorFormProps(kit, c, data, form)} values={values} />,
      issues.length > 0 ? 422 : 200,
    );
  };

  const save = (c: Context, values: SourceForm, sourceId: string | undefined) =>
    steps.afterBody(c, (data) => {
      const index = sourceId === undefined ? undefined : indexOf(data, sourceId);
      if (index !== undefined && index < 0)
        return c.redirect(`/studies/${data.record.id}/edit`, 303);
      const outcome = saveSource(data.inputs, values, index, ctx.models);
      if (!outcome.ok) return sourceForm(c, data, index, values, outcome.issues);
      steps.write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1#sources-heading`, 303);
    });

  app.get('/studies/:id/edit/new-source', (c) => {
    const loaded = steps.load(c);
    return 'response' in loaded
      ? loaded.response
      : sourceForm(c, loaded.data, undefined, EMPTY_SOURCE, []);
  });

  app.post('/studies/:id/edit/new-source', async (c) => {
    const loaded = steps.load(c);
    if ('response' in loaded) return loaded.response;
    return save(c, postedSource(await c.req.parseBody()), undefined);
  });

  app.get('/studies/:id/edit/sources/:sid', (c) => {
    const loaded = steps.load(c);
    if ('response' in loaded) return loaded.response;
    const index = indexOf(loaded.data, c.req.param('sid'));
    const feature = sourceFeatures(loaded.data.inputs)[index];
    if (!feature) return c.redirect(`/studies/${loaded.data.record.id}/edit`, 303);
    return sourceForm(c, loaded.data, index, formOfFeature(feature), []);
  });

  app.post('/studies/:id/edit/sources/:sid', async (c) => {
    const loaded = steps.load(c);
    if ('response' in loaded) return loaded.response;
    return save(c, postedSource(await c.req.parseBody()), c.req.param('sid'));
  });

  app.post('/studies/:id/edit/sources/:sid/remove', (c) =>
    steps.afterBody(c, (data) => {
      const index = indexOf(data, c.req.param('sid'));
      if (index < 0) return c.redirect(`/studies/${data.record.id}/edit`, 303);
      const outcome = removeSource(data.inputs, index, ctx.models);
      if (!outcome.ok) return steps.editorWithNotice(c, data, outcome.issues);
      steps.write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1#sources-heading`, 303);
    }),
  );
}
