import { SITE_CLASSES } from '../../api/study/site-class.ts';
import type { CommunityForm } from '../data/study-edits.ts';
import type { TextKey } from '../text/text-key.ts';
import { FieldProblems } from './field-problems.tsx';
import { EditorFormPage, type EditorFormProps } from './editor-form-page.tsx';
import { FormActions } from '../components/form-rows.tsx';

export interface CommunityFormViewProps extends EditorFormProps {
  readonly values: CommunityForm;
}

const TEXT_FIELDS = [
  { name: 'id', type: 'text' },
  { name: 'name', type: 'text' },
  { name: 'lon', type: 'text', inputmode: 'decimal' },
  { name: 'lat', type: 'text', inputmode: 'decimal' },
  { name: 'vs30', type: 'text', inputmode: 'decimal' },
] as const;

const MORE_FIELDS = [
  { name: 'population', type: 'text', inputmode: 'numeric' },
  { name: 'elevationM', type: 'text', inputmode: 'decimal' },
] as const;

/** Add or edit one community; each problem is shown under its field (plain form post). */
export function CommunityFormView(props: CommunityFormViewProps) {
  const { tr } = props.page;
  const { values } = props;
  const problems = (name: string) => props.fieldIssues.get(name) ?? [];
  const input = (f: {
    readonly name: keyof CommunityForm & string;
    readonly type: string;
    readonly inputmode?: 'decimal' | 'numeric';
  }) => {
    const own = problems(f.name);
    const problemId = `field-${f.name}-problem`;
    return (
      <div class={own.length > 0 ? 'field field-bad' : 'field'}>
        <label for={`field-${f.name}`}>{tr.text(`editor.field.${f.name}` as TextKey)}</label>
        <input
          id={`field-${f.name}`}
          name={f.name}
          type={f.type}
          value={String(values[f.name])}
          inputmode={f.inputmode}
          aria-invalid={own.length > 0 ? 'true' : undefined}
          aria-describedby={own.length > 0 ? problemId : undefined}
          autocomplete="off"
        />
        <FieldProblems tr={tr} id={problemId} issues={own} />
      </div>
    );
  };
  return (
    <EditorFormPage
      form={props}
      text={{ add: 'editor.add', edit: 'editor.edit', intro: 'editor.intro' }}
    >
      <form method="post" action={props.action} class="community-form" novalidate>
        {TEXT_FIELDS.map(input)}
        <div class={problems('siteClass').length > 0 ? 'field field-bad' : 'field'}>
          <label for="field-siteClass">{tr.text('editor.field.siteClass')}</label>
          <select
            id="field-siteClass"
            name="siteClass"
            aria-describedby={
              problems('siteClass').length > 0 ? 'field-siteClass-problem' : undefined
            }
          >
            <option
              value=""
              selected={values.siteClass === ''}
              lang={tr.fallbackLang('editor.field.siteClassNone')}
            >
              {tr.t('editor.field.siteClassNone')}
            </option>
            {SITE_CLASSES.map((sc) => (
              <option value={sc} selected={values.siteClass === sc}>
                {sc}
              </option>
            ))}
          </select>
          <FieldProblems tr={tr} id="field-siteClass-problem" issues={problems('siteClass')} />
        </div>
        {MORE_FIELDS.map(input)}
        <div class="field field-check">
          <input
            id="field-coastal"
            name="coastal"
            type="checkbox"
            value="true"
            checked={values.coastal}
          />
          <label for="field-coastal">{tr.text('editor.field.coastal')}</label>
          <FieldProblems tr={tr} id="field-coastal-problem" issues={problems('coastal')} />
        </div>
        <FormActions tr={tr} studyId={props.studyId} save="editor.save" />
      </form>
    </EditorFormPage>
  );
}
