import type { InputIssue } from '../../api/engine/errors.ts';
import { TECTONIC_SETTINGS, type TectonicSetting } from '../../api/engine/model.ts';
import { DEFAULT_SETTINGS } from '../../api/study/settings-schema.ts';
import { WEIGHT_SUM_TOLERANCE } from '../../api/study/branches-schema.ts';
import { SETTING_FIELDS, type MotionForm, type SettingField } from '../data/motion-form.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import type { TextKey } from '../text/text-key.ts';
import { FieldProblems, FormProblems } from './field-problems.tsx';
import { DataTable } from '../components/data-table.tsx';
import { FormActions } from '../components/form-rows.tsx';

export interface MotionFormViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  readonly values: MotionForm;
  /** The models the engine offers for each tectonic setting. */
  readonly offered: Readonly<Record<TectonicSetting, readonly string[]>>;
  /** Problems by field ("crustal.0.weight", "crustal", "settings.zoneCellKm"), and the others. */
  readonly fieldIssues: ReadonlyMap<string, readonly InputIssue[]>;
  readonly otherIssues: readonly InputIssue[];
}

/** A setting's default as the form would show it, for the placeholder. */
function defaultText(key: SettingField): string {
  const value = (DEFAULT_SETTINGS as unknown as Record<string, unknown>)[key];
  return Array.isArray(value) ? value.join(', ') : value === undefined ? '' : String(value);
}

/** The sum of a setting's weights as typed, or undefined while one is not a number. */
function weightSum(rows: MotionForm['branches'][string]): number | undefined {
  let sum = 0;
  for (const row of rows) {
    const value = Number(row.weight.trim().replace(',', '.'));
    if (row.weight.trim() === '' || !Number.isFinite(value)) return undefined;
    sum += value;
  }
  return sum;
}

/** Decimals to show a sum of weights with: as typed, to the 6 the tolerance (1e-6) needs at most. */
function decimalsOf(sum: number): number {
  return (String(Number(sum.toFixed(6))).split('.')[1] ?? '').length;
}

/**
 * The ground-motion logic tree per tectonic setting (model and weight; a row removed, a model
 * added from those the engine offers for the setting) and the study's settings, in one form.
 */
export function MotionFormView(props: MotionFormViewProps) {
  const { tr } = props.page;
  const problems = (name: string) => props.fieldIssues.get(name) ?? [];
  const bad = (name: string) => problems(name).length > 0;
  const described = (name: string, id: string, help?: string) =>
    [help, bad(name) ? `${id}-problem` : undefined].filter(Boolean).join(' ') || undefined;
  return (
    <StudyPage
      page={props.page}
      study={{ id: props.studyId, name: props.studyName }}
      titleKey="motion.title"
      section="edit"
    >
      <p>{tr.text('motion.intro', { tolerance: String(WEIGHT_SUM_TOLERANCE) })}</p>
      <FormProblems tr={tr} fieldIssues={props.fieldIssues} otherIssues={props.otherIssues} />
      <form
        method="post"
        action={`/studies/${props.studyId}/edit/ground-motion`}
        class="community-form motion-form"
        novalidate
      >
        <h2 id="branches-heading">{tr.text('motion.branches')}</h2>
        {TECTONIC_SETTINGS.map((setting) => {
          const rows = props.values.branches[setting] ?? [];
          const sum = weightSum(rows);
          const listed = new Set(rows.map((r) => r.model.toLowerCase()));
          const addable = props.offered[setting].filter((m) => !listed.has(m.toLowerCase()));
          const sumId = `branch-${setting}-sum`;
          return (
            <fieldset data-setting={setting}>
              <legend>{tr.text(`source.choice.${setting}`)}</legend>
              <DataTable
                tr={tr}
                scroll
                caption={tr.text('motion.caption', { setting: tr.t(`source.choice.${setting}`) })}
                captionClass="visually-hidden"
                columns={['motion.col.model', 'motion.col.weight', 'motion.col.remove']}
              >
                {rows.map((row, i) => {
                  const at = `${setting}.${i}`;
                  const id = `branch-${setting}-${i}`;
                  return (
                    <tr data-model={row.model}>
                      <th scope="row">
                        <input type="hidden" name={`branch.${at}.model`} value={row.model} />
                        {row.model}
                        <FieldProblems
                          tr={tr}
                          id={`${id}-model-problem`}
                          issues={problems(`${at}.model`)}
                        />
                      </th>
                      <td
                        data-label={tr.t('motion.col.weight')}
                        class={bad(`${at}.weight`) ? 'field-bad' : undefined}
                      >
                        <input
                          id={`${id}-weight`}
                          name={`branch.${at}.weight`}
                          type="text"
                          inputmode="decimal"
                          value={row.weight}
                          aria-label={tr.t('motion.weightOf', { model: row.model })}
                          aria-invalid={bad(`${at}.weight`) || bad(setting) ? 'true' : undefined}
                          aria-describedby={described(
                            `${at}.weight`,
                            `${id}-weight`,
                            bad(setting) ? `${sumId} ${sumId}-problem` : sumId,
                          )}
                          autocomplete="off"
                        />
                        <FieldProblems
                          tr={tr}
                          id={`${id}-weight-problem`}
                          issues={problems(`${at}.weight`)}
                        />
                      </td>
                      <td>
                        {/* A table cell keeps its own display, so the row's borders line up. */}
                        <div class="field-check">
                          <input
                            id={`${id}-remove`}
                            name={`branch.${at}.remove`}
                            type="checkbox"
                            value="true"
                          />
                          <label for={`${id}-remove`}>
                            {tr.text('motion.removeModel', { model: row.model })}
                          </label>
                        </div>
                      </td>
                    </tr>
                  );
                })}
              </DataTable>
              <p id={sumId} class="help">
                {sum === undefined
                  ? tr.text('motion.sumUnknown')
                  : tr.text('motion.sum', { sum: tr.number(sum, decimalsOf(sum)) })}
              </p>
              <FieldProblems tr={tr} id={`${sumId}-problem`} issues={problems(setting)} />
              {addable.length > 0 && (
                <div class="motion-add">
                  <div class="field">
                    <label for={`add-${setting}-model`}>{tr.text('motion.addModel')}</label>
                    <select id={`add-${setting}-model`} name={`add.${setting}.model`}>
                      <option value="">—</option>
                      {addable.map((name) => (
                        <option value={name}>{name}</option>
                      ))}
                    </select>
                  </div>
                  <div class="field">
                    <label for={`add-${setting}-weight`}>{tr.text('motion.addWeight')}</label>
                    <input
                      id={`add-${setting}-weight`}
                      name={`add.${setting}.weight`}
                      type="text"
                      inputmode="decimal"
                      autocomplete="off"
                    />
                  </div>
                </div>
              )}
            </fieldset>
          );
        })}
        <h2 id="settings-heading">{tr.text('motion.settings')}</h2>
        <p>{tr.text('motion.settingsIntro')}</p>
        <fieldset>
          <legend>{tr.text('motion.settingsLegend')}</legend>
          {SETTING_FIELDS.map((key) => {
            const name = `settings.${key}`;
            const id = `setting-${key}`;
            return (
              <div class={bad(name) ? 'field field-bad' : 'field'}>
                <label for={id}>{tr.text(`motion.field.${key}` as TextKey)}</label>
                <input
                  id={id}
                  name={name}
                  type="text"
                  value={props.values.settings[key]}
                  placeholder={defaultText(key)}
                  inputmode={
                    key === 'measures' || key === 'intensityMeasure' ? undefined : 'decimal'
                  }
                  aria-invalid={bad(name) ? 'true' : undefined}
                  aria-describedby={described(name, id)}
                  autocomplete="off"
                />
                <FieldProblems tr={tr} id={`${id}-problem`} issues={problems(name)} />
              </div>
            );
          })}
        </fieldset>
        <FormActions tr={tr} studyId={props.studyId} save="motion.save" />
      </form>
    </StudyPage>
  );
}
