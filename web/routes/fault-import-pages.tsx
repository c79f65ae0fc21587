import type { Context, Hono } from 'hono';
import type { InputIssue } from '../../api/engine/errors.ts';
import { studyIssuesByFault, studySourceFeatures } from '../../api/study/fault-files/add-faults.ts';
import {
  DEFAULT_NUMBERS,
  STARTING_DEFAULTS,
  type DefaultsText,
} from '../../api/study/fault-files/fault-defaults.ts';
import {
  FAULT_FIELDS,
  guessFaultMapping,
  type FaultMapping,
} from '../../api/study/fault-files/fault-fields.ts';
import { previewFaults, readFaultUpload, type FaultImportPreview } from '../data/fault-import.ts';
import { addSources } from '../data/study-edits.ts';
import { FaultImportView } from '../views/fault-import-view.tsx';
import { field, type PageKit, uploadedOrCarried } from './page-kit.ts';
import type { EditorSteps } from './source-pages.tsx';

type Form = Record<string, string | File | (string | File)[]>;

/** The mapping and defaults as posted; a first upload gets the guess and the starting defaults. */
function postedChoices(form: Form, attributes: readonly string[]) {
  if (field(form, 'mapped') !== '1')
    return { mapping: guessFaultMapping(attributes), defaults: { ...STARTING_DEFAULTS } };
  const mapping: FaultMapping = {};
  for (const key of FAULT_FIELDS) {
    const column = field(form, `map.${key}`);
    if (column) mapping[key] = column;
  }
  const defaults: DefaultsText = { setting: field(form, 'default.setting') ?? 'crustal' };
  for (const key of DEFAULT_NUMBERS) defaults[key] = field(form, `default.${key}`) ?? '';
  return { mapping, defaults };
}

/**
 * Faults from a regional file, in the editor: the file is read and shown with its mapping,
 * defaults and problems; it is carried in the form (base64) while they are changed; the faults
 * are added to the study's sources only when none has a problem and the whole study validates.
 */
export function faultImportPages(app: Hono, kit: PageKit, steps: EditorSteps): void {
  const { ctx } = kit;
  const path = '/studies/:id/edit/import-faults';

  const view = (
    c: Context,
    data: Parameters<EditorSteps['write']>[0],
    extra: { preview?: FaultImportPreview; fileData?: string; issues?: readonly InputIssue[] },
    status: 200 | 422,
  ) =>
    kit.render(
      c,
      <FaultImportView
        page={kit.page(c)}
        studyId={data.record.id}
        studyName={data.study.name}
        {...(extra.preview ? { preview: extra.preview } : {})}
        {...(extra.fileData !== undefined ? { fileData: extra.fileData } : {})}
        issues={extra.issues ?? []}
      />,
      status,
    );

  app.get(path, (c) => {
    const loaded = steps.load(c);
    return 'response' in loaded ? loaded.response : view(c, loaded.data, {}, 200);
  });

  app.post(path, async (c) => {
    const loaded = steps.load(c);
    if ('response' in loaded) return loaded.response;
    const form = await c.req.parseBody();
    const upload = await uploadedOrCarried(form);
    if (!upload)
      return view(
        c,
        loaded.data,
        { issues: [{ path: 'file', message: kit.tr(c).t('editor.upload.noFile') }] },
        422,
      );
    const read = await readFaultUpload(upload.bytes, upload.name);
    if (!read.ok) return view(c, loaded.data, { issues: [read.issue] }, 422);
    const fileData = Buffer.from(upload.bytes).toString('base64');
    const { mapping, defaults } = postedChoices(upload.chosen ? {} : form, read.file.attributes);
    const saving = field(form, 'step') === 'save';
    // Applied to the study as read after the file has arrived, in one transaction with the write.
    return steps.afterBody(c, (data) => {
      const preview = previewFaults(read.file, mapping, defaults, data.inputs.raw);
      const bad = preview.defaultIssues.length > 0 || preview.problems.length > 0;
      if (!saving || bad) return view(c, data, { preview, fileData }, bad && saving ? 422 : 200);
      const outcome = addSources(data.inputs, preview.features, ctx.models);
      if (!outcome.ok) {
        const own = studySourceFeatures(data.inputs.raw).length;
        const split = studyIssuesByFault(outcome.issues, own, preview.features);
        return view(
          c,
          data,
          { preview: { ...preview, problems: split.problems }, fileData, issues: split.others },
          422,
        );
      }
      steps.write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1#sources-heading`, 303);
    });
  });
}
