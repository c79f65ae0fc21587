import type { Child } from 'hono/jsx';

/** One of a form's submit buttons: the value it sends under the form's `name`, and its words. */
export interface StepButton {
  readonly value: string;
  readonly label: Child;
}

/**
 * The closing line of a form that is sent in steps: a button for the step that only checks
 * (`check`), the primary button that goes on (`next`), both sending `name`, then `after`.
 */
export function StepActions(props: {
  readonly name: string;
  readonly check: StepButton;
  readonly next: StepButton;
  readonly after?: Child;
}) {
  return (
    <p class="form-actions">
      <button type="submit" name={props.name} value={props.check.value}>
        {props.check.label}
      </button>{' '}
      <button type="submit" name={props.name} value={props.next.value} class="button-primary">
        {props.next.label}
      </button>
      {props.after}
    </p>
  );
}
