import type { Child } from 'hono/jsx';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/**
 * A column's heading: its text (by key, or already made), `numeric` for a column of numbers
 * (set right), or `blank` for a column of actions that has no heading.
 */
export type ColumnHead =
  | TextKey
  | { readonly key: TextKey; readonly numeric: true }
  | { readonly label: Child; readonly numeric: true }
  | { readonly blank: true };

function ColumnHeading(props: { readonly tr: Translator; readonly column: ColumnHead }) {
  const { column } = props;
  if (typeof column === 'string') return <th scope="col">{props.tr.text(column)}</th>;
  if ('blank' in column) return <td />;
  return (
    <th scope="col" class="numeric">
      {'key' in column ? props.tr.text(column.key) : column.label}
    </th>
  );
}

export interface DataTableProps {
  readonly tr: Translator;
  /** Classes beside `data-table`. */
  readonly class?: string;
  readonly id?: string;
  readonly caption: Child;
  readonly captionClass?: string;
  readonly columns: readonly ColumnHead[];
  /** In a box that scrolls sideways on a narrow screen. */
  readonly scroll?: boolean;
  /** The rows of the body. */
  readonly children?: Child;
  /** The rows of a footer (totals), when there is one. */
  readonly foot?: Child;
}

/** A table of the pages: caption, one row of column headings, then the rows it is given. */
export function DataTable(props: DataTableProps) {
  const { tr } = props;
  const table = (
    <table class={props.class ? `data-table ${props.class}` : 'data-table'} id={props.id}>
      <caption class={props.captionClass}>{props.caption}</caption>
      <thead>
        <tr>
          {props.columns.map((column) => (
            <ColumnHeading tr={tr} column={column} />
          ))}
        </tr>
      </thead>
      <tbody>{props.children}</tbody>
      {props.foot && <tfoot>{props.foot}</tfoot>}
    </table>
  );
  return props.scroll ? <div class="table-scroll">{table}</div> : table;
}

/** A cell labelled with its column's heading (shown beside the value when a narrow screen stacks the rows). */
export function LabelledCell(props: {
  readonly tr: Translator;
  readonly column: TextKey;
  readonly numeric?: boolean;
  readonly children?: Child;
}) {
  return (
    <td class={props.numeric ? 'numeric' : undefined} data-label={props.tr.t(props.column)}>
      {props.children}
    </td>
  );
}
