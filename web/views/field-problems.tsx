import type { InputIssue } from '../../api/engine/errors.ts';

/** The problems of one field or upload, shown right beside it (referenced by aria-describedby). */
export function FieldProblems(props: { readonly id: string; readonly issues: readonly InputIssue[]; readonly describe?: (issue: InputIssue) => string }) {
  if (props.issues.length === 0) return null;
  return (
    <ul class="field-problems" id={props.id}>
      {props.issues.map((issue) => (
        <li data-path={issue.path}>{props.describe ? props.describe(issue) : issue.message}</li>
      ))}
    </ul>
  );
}
