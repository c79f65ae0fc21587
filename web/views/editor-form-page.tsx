import type { Child } from 'hono/jsx';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import type { TextKey } from '../text/text-key.ts';
import { FormProblems } from './field-problems.tsx';

/** What the editor's form pages (a community's, a source's) share. */
export interface EditorFormProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  /** Where the form posts. */
  readonly action: string;
  /** The name of the item being edited; absent when adding one. */
  readonly editing?: string | undefined;
  /** Problems by form field, and the others (listed above the form). */
  readonly fieldIssues: ReadonlyMap<string, readonly InputIssue[]>;
  readonly otherIssues: readonly InputIssue[];
}

/**
 * An editor form's page: the heading (adding or editing), the intro, "not saved" with the
 * problems that belong to no field when there are any, then the form itself.
 */
export function EditorFormPage(props: {
  readonly form: EditorFormProps;
  readonly text: { readonly add: TextKey; readonly edit: TextKey; readonly intro: TextKey };
  readonly children: Child;
}) {
  const { form } = props;
  const { tr } = form.page;
  const headingKey = form.editing === undefined ? props.text.add : props.text.edit;
  const heading = { name: form.editing ?? '' };
  return (
    <TitledPage
      page={form.page}
      titleKey={headingKey}
      titleValues={heading}
      study={{ id: form.studyId, name: form.studyName }}
      section="edit"
    >
      <p>{tr.text(props.text.intro)}</p>
      <FormProblems tr={tr} fieldIssues={form.fieldIssues} otherIssues={form.otherIssues} />
      {props.children}
    </TitledPage>
  );
}
