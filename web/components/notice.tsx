import type { Child } from 'hono/jsx';

/** A line that says what just happened (saved, deleted, added), announced to screen readers. */
export function Notice(props: { readonly children?: Child }) {
  return (
    <p class="notice" role="status">
      {props.children}
    </p>
  );
}
