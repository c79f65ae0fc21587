import type { Child } from 'hono/jsx';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { Translator } from '../text/translator.ts';
import { FieldProblems } from './field-problems.tsx';

/** A labelled choice of a form (its options are the children), with its problems under it. */
export function SelectField(props: {
  readonly tr: Translator;
  /** The select's id, which the label names. */
  readonly id: string;
  readonly name: string;
  readonly label: Child;
  /** The ids of what describes the choice: its problems, when there are any. */
  readonly describedBy: string | undefined;
  /** Marks the choice as refused to assistive technology. */
  readonly invalid?: boolean;
  readonly problemId: string;
  readonly issues: readonly InputIssue[];
  readonly children?: Child;
}) {
  return (
    <div class="field">
      <label for={props.id}>{props.label}</label>
      <select
        id={props.id}
        name={props.name}
        aria-describedby={props.describedBy}
        aria-invalid={props.invalid ? 'true' : undefined}
      >
        {props.children}
      </select>
      <FieldProblems tr={props.tr} id={props.problemId} issues={props.issues} />
    </div>
  );
}
