import type { Child } from 'hono/jsx';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/** A column's heading: its text, and `numeric` for a column of numbers (set right). */
export type ColumnHead = TextKey | { readonly key: TextKey; readonly numeric: true };

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
}

/** A table of the pages: caption, one row of column headings, then the rows it is given. */
export function DataTable(props: DataTableProps) {
  const { tr } = props;
  const table = (
    <table class={props.class ? `data-table ${props.class}` : 'data-table'} id={props.id}>
      <caption class={props.captionClass}>{props.caption}</caption>
      <thead>
        <tr>
          {props.columns.map((column) =>
            typeof column === 'string' ? (
              <th scope="col">{tr.text(column)}</th>
            ) : (
              <th scope="col" class="numeric">
                {tr.text(column.key)}
              </th>
            ),
          )}
        </tr>
      </thead>
      <tbody>{props.children}</tbody>
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
