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
