import type { Child } from 'hono/jsx';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { ColumnPick } from '../data/community-import.ts';
import { issueLine } from '../data/study-edits.ts';
import type { Translator } from '../text/translator.ts';
import { FieldProblems } from './field-problems.tsx';
import { FileField } from '../components/form-rows.tsx';
import { DataTable } from '../components/data-table.tsx';

/** An upload that did not validate: which form, its problems, and the text (for the line view). */
export interface UploadProblem {
  readonly upload: 'communities' | 'sources';
  readonly issues: readonly InputIssue[];
  readonly text?: string;
  /** Columns to pick, when a communities file's required columns were not recognised. */
  readonly pick?: ColumnPick;
}

/** Most lines of an uploaded CSV shown back with their problems. */
const PREVIEW_LINES = 200;

/** Where each of the editor's uploads posts, below the study's editor. */
const UPLOAD_PATHS = { communities: 'communities-csv', sources: 'sources-geojson' } as const;

/** One of the editor's uploads: its section, the form with the file, and the last file's problems. */
export function UploadSection(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly upload: UploadProblem['upload'];
  readonly problem: UploadProblem | undefined;
  readonly describe: (issue: InputIssue) => Child;
  /** What follows the form. */
  readonly children?: Child;
}) {
  const { tr, upload, problem } = props;
  const heading = `upload-${upload}-heading`;
  const problemsId = `${upload}-problems`;
  const action = `/studies/${props.studyId}/edit/${UPLOAD_PATHS[upload]}#${heading}`;
  return (
    <section aria-labelledby={heading} class="upload">
      <h2 id={heading}>{tr.text(`editor.upload.${upload}`)}</h2>
      <form method="post" action={action} enctype="multipart/form-data">
        <FileField
          tr={tr}
          upload={upload}
          text={{ label: 'editor.upload.file', help: `editor.upload.${upload}Help` }}
          problems={problem !== undefined}
        >
          {problem && (
            <div class="upload-problems" data-upload={upload}>
              <p class="problem-title">{tr.text('editor.problems')}</p>
              <FieldProblems
                tr={tr}
                id={problemsId}
                issues={problem.issues}
                describe={props.describe}
              />
              {upload === 'communities' && problem.text !== undefined && (
                <CsvLines tr={tr} text={problem.text} issues={problem.issues} />
              )}
            </div>
          )}
        </FileField>
        <button type="submit">{tr.text('editor.upload.button')}</button>
      </form>
      {props.children}
    </section>
  );
}

/** The uploaded CSV's lines, each bad line with its problems beside it. */
function CsvLines(props: {
  readonly tr: Translator;
  readonly text: string;
  readonly issues: readonly InputIssue[];
}) {
  const { tr } = props;
  const lines = props.text
    .replace(/^\uFEFF/, '')
    .split(/\r\n|\r|\n/)
    .slice(0, PREVIEW_LINES);
  const byLine = new Map<number, InputIssue[]>();
  for (const issue of props.issues) {
    const line = issueLine(issue.path);
    if (line !== undefined) byLine.set(line, [...(byLine.get(line) ?? []), issue]);
  }
  return (
    <DataTable
      tr={tr}
      class="csv-lines"
      caption={tr.text('editor.csvPreview')}
      columns={[{ key: 'editor.col.line', numeric: true }, 'editor.col.text', 'editor.col.problem']}
    >
      {lines.map((text, i) => {
        const problems = byLine.get(i + 1) ?? [];
        return (
          <tr class={problems.length > 0 ? 'line-bad' : undefined} data-line={i + 1}>
            <th scope="row" class="numeric">
              {i + 1}
            </th>
            <td>
              <code>{text}</code>
            </td>
            <td>
              {tr.english(
                problems
                  .map(
                    (p) =>
                      p.path.split(`[line ${i + 1}]`)[1]?.replace(/^\./, '') + ': ' + p.message,
                  )
                  .join('; '),
              )}
            </td>
          </tr>
        );
      })}
    </DataTable>
  );
}
