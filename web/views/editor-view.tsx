import type { Child } from 'hono/jsx';
import { sourceSanity } from '../../api/engine/sanity/source-sanity.ts';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { Study } from '../../api/engine/model.ts';
import type { StudyPart } from '../../api/study/load-study.ts';
import type { ColumnPick } from '../data/community-import.ts';
import { issueFeature, issueLine } from '../data/study-edits.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { mapFrame, studyPoints } from '../maps/map-frame.ts';
import { StudyMap } from '../maps/study-map.tsx';
import type { Translator } from '../text/translator.ts';
import { ColumnPickForm } from './column-pick-view.tsx';
import { DraftNotice } from './draft-notice.tsx';
import { FieldProblems } from './field-problems.tsx';
import { Notice } from '../components/notice.tsx';
import { FileField } from '../components/form-rows.tsx';
import { RowActions } from '../components/row-actions.tsx';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

/** An upload that did not validate: which form, its problems, and the text (for the line view). */
export interface UploadProblem {
  readonly upload: 'communities' | 'sources';
  readonly issues: readonly InputIssue[];
  readonly text?: string;
  /** Columns to pick, when a communities file's required columns were not recognised. */
  readonly pick?: ColumnPick;
}

/** Warnings about the sources (engine/sanity/source-sanity.ts): shown, never a reason to refuse. */
function SourceChecks(props: { tr: Translator; study: Study }) {
  const warnings = sourceSanity(props.study);
  if (warnings.length === 0) return null;
  return (
    <section class="source-checks" aria-labelledby="source-checks-heading">
      <h2 id="source-checks-heading">{props.tr.text('editor.sourceChecks')}</h2>
      <ul class="warnings">
        {warnings.map((w) => (
          <li>{props.tr.english(w.message)}</li>
        ))}
      </ul>
    </section>
  );
}

export interface EditorViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly study: Study;
  /** What a draft still lacks before it can be screened. */
  readonly missing?: readonly StudyPart[];
  readonly saved?: boolean;
  readonly problem?: UploadProblem;
  /** Problems of a removal (e.g. the last community), shown at the top. */
  readonly notice?: readonly InputIssue[];
}

/** The editor's map of the study, px: small, a preview of where the sources and communities are. */
const PREVIEW_MAP = { width: 480, maxHeight: 360, padding: 24 } as const;

/** Most lines of an uploaded CSV shown back with their problems. */
const PREVIEW_LINES = 200;

/** "Line 5, lat: expected a number ..." / "Feature 4 (vennick), dip: ..." / the path as it is. */
export function describeIssue(
  tr: Translator,
  issue: InputIssue,
  featureIds: readonly (string | undefined)[] = [],
): Child {
  const message = tr.english(issue.message);
  const line = issueLine(issue.path);
  if (line !== undefined) {
    const fieldName = issue.path.split(`[line ${line}]`)[1]?.replace(/^\./, '');
    const where = (
      <>
        {tr.text('editor.line', { line })}
        {fieldName ? `, ${fieldName}` : ''}
      </>
    );
    return tr.text('editor.problemAt', { where, message });
  }
  const feature = issueFeature(issue.path);
  if (feature !== undefined) {
    const id = featureIds[feature];
    const rest = issue.path
      .replace(/^sources\.features\[\d+\]\.?/, '')
      .replace(/^properties\./, '');
    const where = (
      <>
        {tr.text('editor.feature', { n: feature + 1 })}
        {`${id ? ` (${id})` : ''}${rest ? `, ${rest}` : ''}`}
      </>
    );
    return tr.text('editor.problemAt', { where, message });
  }
  return tr.text('editor.problemAt', { where: issue.path, message });
}

/** The ids of the features of GeoJSON text, for naming them in problems; empty when it does not parse. */
function featureIdsOf(text: string | undefined): (string | undefined)[] {
  if (text === undefined) return [];
  try {
    const value = JSON.parse(text) as { features?: { properties?: { id?: unknown } }[] };
    return (value.features ?? []).map((f) =>
      typeof f?.properties?.id === 'string' ? f.properties.id : undefined,
    );
  } catch {
    return [];
  }
}

/** The editor: communities (edit, add, remove), CSV and GeoJSON uploads with their problems inline. */
export function EditorView(props: EditorViewProps) {
  const { tr } = props.page;
  const { study, studyId, problem } = props;
  const csvProblem = problem?.upload === 'communities' ? problem : undefined;
  const geoProblem = problem?.upload === 'sources' ? problem : undefined;
  const featureIds = featureIdsOf(geoProblem?.text);
  return (
    <StudyPage page={props.page} study={{ id: studyId, name: study.name }} section="edit">
      <p>{tr.text('editor.intro')}</p>
      {props.saved && <Notice>{tr.text('editor.saved')}</Notice>}
      {(problem || (props.notice?.length ?? 0) > 0) && (
        <p class="problem" role="alert">
          {tr.text('editor.notSaved')}
        </p>
      )}
      <DraftNotice tr={tr} studyId={studyId} missing={props.missing ?? []} linkToEditor={false} />
      <FieldProblems
        tr={tr}
        id="editor-notice"
        issues={props.notice ?? []}
        describe={(i) => describeIssue(tr, i)}
      />
      <SourceChecks tr={tr} study={study} />

      <section aria-labelledby="communities-heading">
        <h2 id="communities-heading">{tr.text('editor.communities')}</h2>
        <p>
          <a class="button" href={`/studies/${studyId}/edit/new-community`}>
            {tr.text('editor.add')}
          </a>
        </p>
        <DataTable
          tr={tr}
          class="editor-table"
          scroll
          caption={tr.text('editor.communitiesCaption')}
          columns={[
            'editor.field.name',
            'editor.col.id',
            { key: 'editor.col.lon', numeric: true },
            { key: 'editor.col.lat', numeric: true },
            'editor.col.site',
            { key: 'editor.col.people', numeric: true },
            'editor.col.coastal',
            'editor.col.actions',
          ]}
        >
          {study.communities.map((c) => (
            <tr data-community={c.id}>
              <th scope="row">{c.name}</th>
              <LabelledCell tr={tr} column="editor.col.id">
                <code>{c.id}</code>
              </LabelledCell>
              <LabelledCell tr={tr} column="editor.col.lon" numeric>
                {String(c.lon)}
              </LabelledCell>
              <LabelledCell tr={tr} column="editor.col.lat" numeric>
                {String(c.lat)}
              </LabelledCell>
              <LabelledCell tr={tr} column="editor.col.site">
                {c.vs30Basis === 'measured'
                  ? `${c.vs30} m/s`
                  : c.vs30Proxy !== undefined
                    ? tr.text('editor.siteProxy', {
                        vs30: tr.number(c.vs30),
                        siteClass: c.vs30Proxy.siteClass,
                      })
                    : `${c.siteClass} (${c.vs30} m/s)`}
              </LabelledCell>
              <LabelledCell tr={tr} column="editor.col.people" numeric>
                {c.population === undefined ? '' : tr.number(c.population)}
              </LabelledCell>
              <td data-label={c.coastal ? tr.t('editor.col.coastal') : undefined}>
                {c.coastal ? tr.text('editor.coastalYes') : ''}
              </td>
              <RowActions
                href={`/studies/${studyId}/edit/communities/${encodeURIComponent(c.id)}`}
                edit={tr.text('editor.edit', { name: c.name })}
                remove={tr.text('editor.remove', { name: c.name })}
              />
            </tr>
          ))}
        </DataTable>
      </section>

      <UploadSection
        tr={tr}
        studyId={studyId}
        upload="communities"
        problem={csvProblem}
        describe={(i) => describeIssue(tr, i)}
      >
        {csvProblem?.pick && (
          <ColumnPickForm
            tr={tr}
            action={`/studies/${studyId}/edit/communities-csv#upload-communities-heading`}
            pick={csvProblem.pick}
          />
        )}
      </UploadSection>

      <section aria-labelledby="sources-heading">
        <h2 id="sources-heading">{tr.text('editor.sources')}</h2>
        <p>
          <a class="button" href={`/studies/${studyId}/edit/new-source`}>
            {tr.text('source.add')}
          </a>{' '}
          <a class="button" href={`/studies/${studyId}/edit/import-faults`}>
            {tr.text('faults.link')}
          </a>
        </p>
        {studyPoints(study).length > 0 && (
          <figure class="editor-preview">
            <StudyMap
              tr={tr}
              study={study}
              frame={mapFrame(study, PREVIEW_MAP)}
              idPrefix="editor-map"
              labels={false}
            />
            <figcaption>{tr.text('source.preview')}</figcaption>
          </figure>
        )}
        <DataTable
          tr={tr}
          scroll
          caption={tr.text('editor.sourcesCaption')}
          columns={[
            'editor.col.source',
            'editor.col.id',
            'editor.col.kind',
            'editor.col.setting',
            'editor.col.actions',
          ]}
        >
          {study.sources.map((s) => (
            <tr data-source={s.id}>
              <th scope="row">{s.name}</th>
              <LabelledCell tr={tr} column="editor.col.id">
                <code>{s.id}</code>
              </LabelledCell>
              <LabelledCell tr={tr} column="editor.col.kind">
                {tr.text(`editor.kind.${s.kind}`)}
              </LabelledCell>
              <LabelledCell tr={tr} column="editor.col.setting">
                {s.setting}
              </LabelledCell>
              <RowActions
                href={`/studies/${studyId}/edit/sources/${encodeURIComponent(s.id)}`}
                edit={tr.text('source.edit', { name: s.name })}
                remove={tr.text('source.remove', { name: s.name })}
              />
            </tr>
          ))}
        </DataTable>
      </section>

      <UploadSection
        tr={tr}
        studyId={studyId}
        upload="sources"
        problem={geoProblem}
        describe={(i) => describeIssue(tr, i, featureIds)}
      />

      <section aria-labelledby="motion-heading">
        <h2 id="motion-heading">{tr.text('motion.heading')}</h2>
        <p>{tr.text('motion.editorIntro')}</p>
        <p>
          <a class="button" href={`/studies/${studyId}/edit/ground-motion`}>
            {tr.text('motion.link')}
          </a>
        </p>
      </section>
    </StudyPage>
  );
}

/** Where each of the editor's uploads posts, below the study's editor. */
const UPLOAD_PATHS = { communities: 'communities-csv', sources: 'sources-geojson' } as const;

/** One of the editor's uploads: its section, the form with the file, and the last file's problems. */
function UploadSection(props: {
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
