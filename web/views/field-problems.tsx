import type { Child } from 'hono/jsx';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { Translator } from '../text/translator.ts';

/**
 * The problems of one field or upload, shown right beside it (referenced by aria-describedby).
 * The service's messages are English on every page.
 */
export function FieldProblems(props: {
  readonly tr: Translator;
  readonly id: string;
  readonly issues: readonly InputIssue[];
  readonly describe?: (issue: InputIssue) => Child;
}) {
  if (props.issues.length === 0) return null;
  return (
    <ul class="field-problems" id={props.id}>
      {props.issues.map((issue) => (
        <li data-path={issue.path}>
          {props.describe ? props.describe(issue) : props.tr.english(issue.message)}
        </li>
      ))}
    </ul>
  );
}

/**
 * A form's heading problems: "nothing was saved" when any problem is shown, and the problems
 * that belong to no field, each with its path.
 */
export function FormProblems(props: {
  readonly tr: Translator;
  readonly fieldIssues: ReadonlyMap<string, readonly InputIssue[]>;
  readonly otherIssues: readonly InputIssue[];
}) {
  const { tr } = props;
  return (
    <>
      {(props.otherIssues.length > 0 || props.fieldIssues.size > 0) && (
        <p class="problem" role="alert">
          {tr.text('editor.notSaved')}
        </p>
      )}
      <FieldProblems
        tr={tr}
        id="form-problems"
        issues={props.otherIssues}
        describe={(i) => tr.english(`${i.path}: ${i.message}`)}
      />
    </>
  );
}
