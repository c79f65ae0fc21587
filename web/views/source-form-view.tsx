import type { InputIssue } from '../../api/engine/errors.ts';
import { TECTONIC_SETTINGS } from '../../api/engine/model.ts';
import type { SourceForm, SourceTextField } from '../data/source-form.ts';
import { type PageContext, PageShell } from '../layout/page-shell.tsx';
import type { TextKey } from '../text/text-key.ts';
import { FieldProblems, FormProblems } from './field-problems.tsx';

export interface SourceFormViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  readonly action: string;
  /** The name of the source being edited; absent when adding one. */
  readonly editing?: string | undefined;
  readonly values: SourceForm;
  /** Problems by form field ("dip", "recurrence.bValue", "coordinates"), and the others. */
  readonly fieldIssues: ReadonlyMap<string, readonly InputIssue[]>;
  readonly otherIssues: readonly InputIssue[];
}

const CHOICES: Partial<Record<SourceTextField | 'kind' | 'order', readonly string[]>> = {
  kind: ['fault', 'zone', 'point'],
  order: ['auto', 'lon-lat', 'lat-lon'],
  setting: TECTONIC_SETTINGS,
  mechanism: ['strike-slip', 'reverse', 'normal'],
  'recurrence.type': ['gutenberg-richter', 'moment-balanced', 'fixed'],
  'recurrence.shape': ['', 'gutenberg-richter', 'characteristic'],
};

const GROUPS: readonly { readonly legend: TextKey; readonly fields: readonly SourceTextField[] }[] =
  [
    { legend: 'source.group.about', fields: ['id', 'name', 'setting', 'mechanism'] },
    {
      legend: 'source.group.fault',
      fields: ['dip', 'dipDirection', 'upperDepthKm', 'lowerDepthKm'],
    },
    { legend: 'source.group.area', fields: ['depthKm'] },
    {
      legend: 'source.group.recurrence',
      fields: [
        'recurrence.type',
        'recurrence.bValue',
        'recurrence.mMin',
        'recurrence.mMax',
        'recurrence.rate',
        'recurrence.slipRateMmYr',
        'recurrence.shape',
        'recurrence.magnitude',
      ],
    },
  ];

/** Add or edit one source: kind, coordinates typed or pasted, properties and recurrence; problems under their fields. */
export function SourceFormView(props: SourceFormViewProps) {
  const { tr } = props.page;
  const { values } = props;
  const headingKey = props.editing === undefined ? 'source.add' : 'source.edit';
  const heading = { name: props.editing ?? '' };
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
    <PageShell
      page={props.page}
      title={tr.t(headingKey, heading)}
      titleLang={tr.fallbackLang(headingKey)}
      study={{ id: props.studyId, name: props.studyName }}
      section="edit"
    >
      <h1>{tr.text(headingKey, heading)}</h1>
      <p>{tr.text('source.intro')}</p>
      <FormProblems tr={tr} fieldIssues={props.fieldIssues} otherIssues={props.otherIssues} />
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
            <legend>{tr.text(group.legend)}</legend>
            {group.fields.map(control)}
          </fieldset>
        ))}
        <p class="form-actions">
          <button type="submit" class="button-primary">
            {tr.text('source.save')}
          </button>{' '}
          <a href={`/studies/${props.studyId}/edit`}>{tr.text('editor.cancel')}</a>
        </p>
      </form>
    </PageShell>
  );
}
