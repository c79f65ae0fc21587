import type { InputIssue } from '../../api/engine/errors.ts';
import { StepActions } from '../components/step-actions.tsx';
import { TECTONIC_SETTINGS } from '../../api/engine/model.ts';
import { DEFAULT_NUMBERS } from '../../api/study/fault-files/fault-defaults.ts';
import { FAULT_FIELDS } from '../../api/study/fault-files/fault-fields.ts';
import type { FaultImportPreview } from '../data/fault-import.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import type { TextKey } from '../text/text-key.ts';
import { FieldProblems } from './field-problems.tsx';
import { DataTable } from '../components/data-table.tsx';
import { FileField } from '../components/form-rows.tsx';

export interface FaultImportViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  /** The file as read, its mapping, defaults and problems; absent until a file is chosen. */
  readonly preview?: FaultImportPreview;
  /** The file carried in the form as base64. */
  readonly fileData?: string;
  /** A file that could not be read, or the study's own problems once the faults were added. */
  readonly issues: readonly InputIssue[];
}

/**
 * Faults from a regional file: choose the file; then see how its attributes map to Tremora's
 * fields, the defaults for what it lacks and every missing or out-of-range value by feature,
 * change them, and add the faults. Nothing is saved until the faults and the study are valid.
 */
export function FaultImportView(props: FaultImportViewProps) {
  const { tr } = props.page;
  const action = `/studies/${props.studyId}/edit/import-faults`;
  const preview = props.preview;
  return (
    <TitledPage
      page={props.page}
      titleKey="faults.title"
      study={{ id: props.studyId, name: props.studyName }}
      section="edit"
    >
      <p>{tr.text('faults.intro')}</p>
      <FieldProblems
        tr={tr}
        id="import-problems"
        issues={props.issues}
        describe={(i) => tr.english(`${i.path}: ${i.message}`)}
      />
      <form method="post" action={action} enctype="multipart/form-data" class="community-form">
        <FileField
          tr={tr}
          upload="faults"
          text={{ label: 'faults.file', help: 'faults.fileHelp' }}
        />
        <button type="submit">{tr.text('faults.read')}</button>
      </form>
      {preview && (
        <form
          method="post"
          action={action}
          enctype="multipart/form-data"
          class="community-form fault-import"
        >
          <input type="hidden" name="fileName" value={preview.file.fileName} />
          <input type="hidden" name="fileData" value={props.fileData ?? ''} />
          <input type="hidden" name="mapped" value="1" />
          <p data-read={preview.file.records.length}>
            {tr.text('faults.readCount', {
              file: preview.file.fileName,
              count: String(preview.file.records.length),
            })}
          </p>
          <fieldset>
            <legend>{tr.text('faults.mapping')}</legend>
            <p class="help">{tr.text('faults.mappingHelp')}</p>
            {FAULT_FIELDS.map((key) => (
              <div class="field">
                <label for={`map-${key}`}>{tr.text(`faults.field.${key}` as TextKey)}</label>
                <select id={`map-${key}`} name={`map.${key}`}>
                  <option value="" selected={preview.mapping[key] === undefined}>
                    {tr.text('faults.notInFile')}
                  </option>
                  {preview.file.attributes.map((a) => (
                    <option value={a} selected={preview.mapping[key] === a}>
                      {a}
                    </option>
                  ))}
                </select>
              </div>
            ))}
          </fieldset>
          <fieldset>
            <legend>{tr.text('faults.defaults')}</legend>
            <p class="help">{tr.text('faults.defaultsHelp')}</p>
            <div class="field">
              <label for="default-setting">{tr.text('faults.default.setting')}</label>
              <select id="default-setting" name="default.setting">
                {TECTONIC_SETTINGS.map((s) => (
                  <option value={s} selected={preview.defaults.setting === s}>
                    {tr.t(`source.choice.${s}` as TextKey)}
                  </option>
                ))}
              </select>
            </div>
            {DEFAULT_NUMBERS.map((key) => {
              const own = preview.defaultIssues.filter((i) => i.path === `defaults.${key}`);
              return (
                <div class={own.length > 0 ? 'field field-bad' : 'field'}>
                  <label for={`default-${key}`}>
                    {tr.text(`faults.default.${key}` as TextKey)}
                  </label>
                  <input
                    id={`default-${key}`}
                    name={`default.${key}`}
                    type="text"
                    inputmode="decimal"
                    value={preview.defaults[key] ?? ''}
                    aria-invalid={own.length > 0 ? 'true' : undefined}
                    aria-describedby={own.length > 0 ? `default-${key}-problem` : undefined}
                    autocomplete="off"
                  />
                  <FieldProblems tr={tr} id={`default-${key}-problem`} issues={own} />
                </div>
              );
            })}
          </fieldset>
          {preview.problems.length > 0 && (
            <DataTable
              tr={tr}
              class="fault-problems"
              scroll
              caption={tr.text('faults.problems', { count: String(preview.problems.length) })}
              columns={[
                'faults.col.feature',
                'faults.col.name',
                'faults.col.field',
                'faults.col.from',
                'faults.col.problem',
              ]}
            >
              {preview.problems.map((p) => (
                <tr data-feature={p.feature} data-field={p.field}>
                  <td>{p.feature}</td>
                  <th scope="row">{p.name}</th>
                  <td>
                    <code>{p.field}</code>
                  </td>
                  <td>{p.from ?? ''}</td>
                  <td lang="en">{p.message}</td>
                </tr>
              ))}
            </DataTable>
          )}
          <StepActions
            name="step"
            check={{ value: 'check', label: tr.text('faults.check') }}
            next={{
              value: 'save',
              label: tr.text('faults.save', { count: String(preview.file.records.length) }),
            }}
            after={
              <>
                {' '}
                <a href={`/studies/${props.studyId}/edit`}>{tr.text('editor.cancel')}</a>
              </>
            }
          />
        </form>
      )}
    </TitledPage>
  );
}
