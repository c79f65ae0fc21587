import type { Child } from 'hono/jsx';

export interface RowActionsProps {
  /** The item's page, where it is edited; the item is removed by a post to its `/remove`. */
  readonly href: string;
  /** The link's words and the button's, each naming the item. */
  readonly edit: Child;
  readonly remove: Child;
}

/** A table row's actions: a link to edit the item, and a button that removes it. */
export function RowActions(props: RowActionsProps) {
  return (
    <td class="row-actions">
      <a href={props.href}>{props.edit}</a>
      <form method="post" action={`${props.href}/remove`} class="inline-form">
        <button type="submit" class="button-quiet">
          {props.remove}
        </button>
      </form>
    </td>
  );
}
