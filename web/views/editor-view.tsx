import type { Child } from 'hono/jsx';
import { sourceSanity } from '../../api/engine/sanity/source-sanity.ts';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { Study } from '../../api/engine/model.ts';
import type { StudyPart } from '../../api/study/load-study.ts';
import { issueFeature, issueLine } from '../data/study-edits.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { studyPoints } from '../../api/engine/geometry/study-points.ts';
import { mapFrame } from '../maps/map-frame.ts';
import { StudyMap } from '../maps/study-map.tsx';
import type { Translator } from '../text/translator.ts';
import { ColumnPickForm } from './column-pick-view.tsx';
import { DraftNotice } from './draft-notice.tsx';
import { FieldProblems } from './field-problems.tsx';
import { Notice } from '../components/notice.tsx';
import { LabelledCell } from '../components/data-table.tsx';
import { EditorListRow, EditorListSection } from './editor-list-section.tsx';
import type { UploadProblem } from './upload-section.tsx';

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

      <EditorListSection
        tr={tr}
        studyId={studyId}
        list="communities"
        links={[{ path: 'new-community', text: 'editor.add' }]}
        table={{
          class: 'editor-table',
          columns: [
            'editor.field.name',
            'editor.col.id',
            { key: 'editor.col.lon', numeric: true },
            { key: 'editor.col.lat', numeric: true },
            'editor.col.site',
            { key: 'editor.col.people', numeric: true },
            'editor.col.coastal',
            'editor.col.actions',
          ],
        }}
        rows={study.communities.map((c) => (
          <EditorListRow tr={tr} studyId={studyId} list="communities" item={c}>
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
          </EditorListRow>
        ))}
        problem={csvProblem}
        describe={(i) => describeIssue(tr, i)}
        afterUpload={
          csvProblem?.pick && (
            <ColumnPickForm
              tr={tr}
              action={`/studies/${studyId}/edit/communities-csv#upload-communities-heading`}
              pick={csvProblem.pick}
            />
          )
        }
      />

      <EditorListSection
        tr={tr}
        studyId={studyId}
        list="sources"
        links={[
          { path: 'new-source', text: 'source.add' },
          { path: 'import-faults', text: 'faults.link' },
        ]}
        preview={
          studyPoints(study).length > 0 && (
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
          )
        }
        table={{
          columns: [
            'editor.col.source',
            'editor.col.id',
            'editor.col.kind',
            'editor.col.setting',
            'editor.col.actions',
          ],
        }}
        rows={study.sources.map((s) => (
          <EditorListRow tr={tr} studyId={studyId} list="sources" item={s}>
            <LabelledCell tr={tr} column="editor.col.kind">
              {tr.text(`editor.kind.${s.kind}`)}
            </LabelledCell>
            <LabelledCell tr={tr} column="editor.col.setting">
              {s.setting}
            </LabelledCell>
          </EditorListRow>
        ))}
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
