import type { Child } from 'hono/jsx';
import type { InputIssue } from '../../api/engine/errors.ts';
import { DataTable, LabelledCell, type ColumnHead } from '../components/data-table.tsx';
import { RowActions } from '../components/row-actions.tsx';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';
import { UploadSection, type UploadProblem } from './upload-section.tsx';

/** One of the editor's lists (communities, sources): its section with the table, then its upload. */
export function EditorListSection(props: {
  readonly tr: Translator;
  readonly studyId: string;
  /** Which list: names the section, its heading and caption, the items' pages and the upload. */
  readonly list: UploadProblem['upload'];
  /** The buttons above the table (to add items), each a page below the study's editor and its words. */
  readonly links: readonly { readonly path: string; readonly text: TextKey }[];
  /** What stands between the buttons and the table. */
  readonly preview?: Child;
  readonly table: { readonly class?: string; readonly columns: readonly ColumnHead[] };
  /** The table's rows (EditorListRow). */
  readonly rows: Child;
  readonly problem: UploadProblem | undefined;
  readonly describe: (issue: InputIssue) => Child;
  /** What follows the upload's form. */
  readonly afterUpload?: Child;
}) {
  const { tr, list } = props;
  return (
    <>
      <section aria-labelledby={`${list}-heading`}>
        <h2 id={`${list}-heading`}>{tr.text(`editor.${list}`)}</h2>
        <p>
          {props.links.map((link, i) => (
            <>
              {i > 0 && ' '}
              <a class="button" href={`/studies/${props.studyId}/edit/${link.path}`}>
                {tr.text(link.text)}
              </a>
            </>
          ))}
        </p>
        {props.preview}
        <DataTable tr={tr} scroll caption={tr.text(`editor.${list}Caption`)} {...props.table}>
          {props.rows}
        </DataTable>
      </section>

      <UploadSection
        tr={tr}
        studyId={props.studyId}
        upload={list}
        problem={props.problem}
        describe={props.describe}
      >
        {props.afterUpload}
      </UploadSection>
    </>
  );
}

/** Per list: the row's data attribute naming the item's id, and the words of its actions. */
const ROW = {
  communities: { attribute: 'data-community', edit: 'editor.edit', remove: 'editor.remove' },
  sources: { attribute: 'data-source', edit: 'source.edit', remove: 'source.remove' },
} as const satisfies Record<UploadProblem['upload'], Record<string, string>>;

/**
 * A row of one of the editor's lists: the item's name and id, its other cells, then a link to
 * edit it and a button to remove it.
 */
export function EditorListRow(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly list: UploadProblem['upload'];
  readonly item: { readonly id: string; readonly name: string };
  /** The cells after the id. */
  readonly children?: Child;
}) {
  const { tr, item } = props;
  const row = ROW[props.list];
  return (
    <tr {...{ [row.attribute]: item.id }}>
      <th scope="row">{item.name}</th>
      <LabelledCell tr={tr} column="editor.col.id">
        <code>{item.id}</code>
      </LabelledCell>
      {props.children}
      <RowActions
        href={`/studies/${props.studyId}/edit/${props.list}/${encodeURIComponent(item.id)}`}
        edit={tr.text(row.edit, { name: item.name })}
        remove={tr.text(row.remove, { name: item.name })}
      />
    </tr>
  );
}
