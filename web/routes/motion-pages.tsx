import type { Context, Hono } from 'hono';
import type { InputIssue } from '../../api/engine/errors.ts';
import { TECTONIC_SETTINGS, type TectonicSetting } from '../../api/engine/model.ts';
import {
  motionFormOf,
  motionIssueField,
  postedMotionForm,
  type MotionForm,
} from '../data/motion-form.ts';
import { saveMotion } from '../data/study-edits.ts';
import type { StudyData } from '../data/study-data.ts';
import { MotionFormView } from '../views/motion-form-view.tsx';
import { issuesByField, type PageKit } from './page-kit.ts';
import type { EditorSteps } from './source-pages.tsx';

type Editable = StudyData & { ok: true };

/**
 * The ground-motion branches and the settings of a study, on one page of the editor. The
 * whole candidate study is validated as the API validates it; only a valid one is written.
 */
export function motionPages(app: Hono, kit: PageKit, steps: EditorSteps): void {
  const { ctx } = kit;
  const offered = Object.fromEntries(
    TECTONIC_SETTINGS.map((setting) => [
      setting,
      ctx.models.names.filter((name) => ctx.models.find(name)?.settings.includes(setting)),
    ]),
  ) as Record<TectonicSetting, string[]>;

  const form = (c: Context, data: Editable, values: MotionForm, issues: readonly InputIssue[]) => {
    const { byField, others } = issuesByField(issues, motionIssueField);
    // Settings the post left out are shown as the study holds them.
    const shown = motionFormOf(data.inputs.raw, ctx.models);
    return kit.render(
      c,
      <MotionFormView
        page={kit.page(c)}
        studyId={data.record.id}
        studyName={data.study.name}
        values={{ ...values, branches: { ...shown.branches, ...values.branches } }}
        offered={offered}
        fieldIssues={byField}
        otherIssues={others}
      />,
      issues.length > 0 ? 422 : 200,
    );
  };

  app.get('/studies/:id/edit/ground-motion', (c) => {
    const loaded = steps.load(c);
    if ('response' in loaded) return loaded.response;
    return form(c, loaded.data, motionFormOf(loaded.data.inputs.raw, ctx.models), []);
  });

  app.post('/studies/:id/edit/ground-motion', async (c) => {
    const loaded = steps.load(c);
    if ('response' in loaded) return loaded.response;
    const values = postedMotionForm(await c.req.parseBody());
    return steps.afterBody(c, (data) => {
      const outcome = saveMotion(data.inputs, values, ctx.models);
      if (!outcome.ok) return form(c, data, values, outcome.issues);
      steps.write(data, outcome);
      return c.redirect(`/studies/${data.record.id}/edit?saved=1#motion-heading`, 303);
    });
  });
}
