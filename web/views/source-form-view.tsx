import { TECTONIC_SETTINGS } from '../../api/engine/model.ts';
import { SOURCE_FIELD_GROUPS, type SourceForm, type SourceTextField } from '../data/source-form.ts';
import type { TextKey } from '../text/text-key.ts';
import { FieldProblems } from './field-problems.tsx';
import { EditorFormPage, type EditorFormProps } from './editor-form-page.tsx';
import { FormActions } from '../components/form-rows.tsx';

export interface SourceFormViewProps extends EditorFormProps {
  readonly values: SourceForm;
}

const CHOICES: Partial<Record<SourceTextField | 'kind' | 'order', readonly string[]>> = {
  kind: ['fault', 'zone', 'point'],
  order: ['auto', 'lon-lat', 'lat-lon'],
  setting: TECTONIC_SETTINGS,
  mechanism: ['strike-slip', 'reverse', 'normal'],
  'recurrence.type': ['gutenberg-richter', 'moment-balanced', 'fixed'],
  'recurrence.shape': ['', 'gutenberg-richter', 'characteristic'],
};

/** The form's groups of fields, each in its own fieldset. */
const GROUPS = Object.keys(SOURCE_FIELD_GROUPS) as (keyof typeof SOURCE_FIELD_GROUPS)[];

/** Add or edit one source: kind, coordinates typed or pasted, properties and recurrence; problems under their fields. */
export function SourceFormView(props: SourceFormViewProps) {
  const { tr } = props.page;
  const { values } = props;
  const problems = (name: string) => props.fieldIssues.get(name) ?? [];
  const idOf = (name: string) => `source-${name.replace('.', '-')}`;
  const control = (name: SourceTextField | 'kind' | 'order') => {
    const own = problems(name);
    const id = idOf(name);
    const problemId = `${id}-problem`;
    const choices = CHOICES[name];
    const value = String(values[name]);
    const described = own.length > 0 ? problemId : undefined;
    return (
      <div class={own.length > 0 ? 'field field-bad' : 'field'}>
        <label for={id}>{tr.text(`source.field.${name}` as TextKey)}</label>
        {choices ? (
          <select id={id} name={name} aria-describedby={described}>
            {choices.map((choice) => (
              <option value={choice} selected={value === choice}>
                {choice === '' ? '—' : tr.t(`source.choice.${choice}` as TextKey)}
              </option>
            ))}
          </select>
        ) : (
          <input
            id={id}
            name={name}
            type="text"
            value={value}
            inputmode={name === 'id' || name === 'name' ? undefined : 'decimal'}
            aria-invalid={own.length > 0 ? 'true' : undefined}
            aria-describedby={described}
            autocomplete="off"
          />
        )}
        <FieldProblems tr={tr} id={problemId} issues={own} />
      </div>
    );
  };
  const coordinateIssues = problems('coordinates');
  return (
    <EditorFormPage
      form={props}
      text={{ add: 'source.add', edit: 'source.edit', intro: 'source.intro' }}
    >
      <form method="post" action={props.action} class="community-form source-form" novalidate>
        <fieldset>
          <legend>{tr.text('source.group.where')}</legend>
          {control('kind')}
          <div class={coordinateIssues.length > 0 ? 'field field-bad' : 'field'}>
            <label for="source-coordinates">{tr.text('source.field.coordinates')}</label>
            <textarea
              id="source-coordinates"
              name="coordinates"
              rows={6}
              spellcheck={false}
              aria-invalid={coordinateIssues.length > 0 ? 'true' : undefined}
              aria-describedby={
                coordinateIssues.length > 0
                  ? 'source-coordinates-help source-coordinates-problem'
                  : 'source-coordinates-help'
              }
            >
              {values.coordinates}
            </textarea>
            <p id="source-coordinates-help" class="help">
              {tr.text('source.coordinatesHelp')}
            </p>
            <FieldProblems tr={tr} id="source-coordinates-problem" issues={coordinateIssues} />
          </div>
          {control('order')}
        </fieldset>
        {GROUPS.map((group) => (
          <fieldset>
            <legend>{tr.text(`source.group.${group}`)}</legend>
            {SOURCE_FIELD_GROUPS[group].map(control)}
          </fieldset>
        ))}
        <FormActions tr={tr} studyId={props.studyId} save="source.save" />
      </form>
    </EditorFormPage>
  );
}
