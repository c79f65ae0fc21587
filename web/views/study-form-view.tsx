import type { InputIssue } from '../../api/engine/errors.ts';
import type { ColumnPick } from '../data/community-import.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import { ColumnPickForm } from './column-pick-view.tsx';
import { describeIssue } from './editor-view.tsx';
import { FieldProblems } from './field-problems.tsx';
import { FileField } from '../components/form-rows.tsx';

/** Which form: a new study (name and village file), a new name, or the name of a copy. */
export type StudyFormKind = 'new' | 'rename' | 'duplicate';

export interface StudyFormViewProps {
  readonly page: PageContext;
  readonly kind: StudyFormKind;
  readonly action: string;
  /** The study renamed or copied (absent for a new one). */
  readonly study?: { readonly id: string; readonly name: string };
  readonly name: string;
  readonly nameIssues?: readonly InputIssue[];
  /** Problems of the village file, with the columns to pick where some were not recognised. */
  readonly fileIssues?: readonly InputIssue[];
  readonly pick?: ColumnPick;
}

const TITLES = {
  new: 'newStudy.title',
  rename: 'renameStudy.title',
  duplicate: 'duplicateStudy.title',
} as const;
const BUTTONS = {
  new: 'newStudy.button',
  rename: 'renameStudy.button',
  duplicate: 'duplicateStudy.button',
} as const;

/** A study's name (and, for a new study, its village file), with each problem under its field. */
export function StudyFormView(props: StudyFormViewProps) {
  const { tr } = props.page;
  const { kind } = props;
  const values = { name: props.study?.name ?? '' };
  const nameIssues = props.nameIssues ?? [];
  const fileIssues = props.fileIssues ?? [];
  const failed = nameIssues.length + fileIssues.length > 0;
  return (
    <TitledPage page={props.page} titleKey={TITLES[kind]} titleValues={values}>
      {kind === 'new' && <p>{tr.text('newStudy.intro')}</p>}
      {kind === 'duplicate' && <p>{tr.text('duplicateStudy.intro')}</p>}
      {failed && (
        <p class="problem" role="alert">
          {tr.text('editor.notSaved')}
        </p>
      )}
      <form
        method="post"
        action={props.action}
        enctype={kind === 'new' ? 'multipart/form-data' : undefined}
      >
        <div class={nameIssues.length > 0 ? 'field field-bad' : 'field'}>
          <label for="study-name">{tr.text('studyForm.name')}</label>
          <input
            id="study-name"
            name="name"
            type="text"
            value={props.name}
            maxlength={200}
            required
            aria-invalid={nameIssues.length > 0 ? 'true' : undefined}
            aria-describedby={nameIssues.length > 0 ? 'study-name-problems' : undefined}
            autocomplete="off"
          />
          <FieldProblems tr={tr} id="study-name-problems" issues={nameIssues} />
        </div>
        {kind === 'new' && (
          <FileField
            tr={tr}
            upload="communities"
            text={{ label: 'newStudy.file', help: 'newStudy.fileHelp' }}
            problems={fileIssues.length > 0}
            bad={fileIssues.length > 0}
          >
            <FieldProblems
              tr={tr}
              id="communities-problems"
              issues={fileIssues}
              describe={(i) => describeIssue(tr, i)}
            />
          </FileField>
        )}
        <button type="submit">{tr.text(BUTTONS[kind])}</button>
      </form>
      {props.pick && (
        <ColumnPickForm
          tr={tr}
          action={props.action}
          pick={props.pick}
          hidden={{ name: props.name }}
        />
      )}
      <p>
        <a href={props.study ? `/studies/${props.study.id}` : '/'}>
          {props.study ? tr.text('nav.overview') : tr.text('studyForm.cancel')}
        </a>
      </p>
    </TitledPage>
  );
}
