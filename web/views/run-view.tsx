import type { RunRecord } from '../../api/store/index.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { RunStatus } from './run-status.tsx';

/**
 * A run in progress. Without script the reader refreshes the page; with script
 * (static/tremora.js) the bar follows GET /api/runs/{id} and the page moves on when it is done.
 */
export function RunView(props: {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  readonly run: RunRecord;
}) {
  const { tr } = props.page;
  const { run, studyId } = props;
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: props.studyName }}
      titleKey="run.title"
    >
      <RunStatus
        page={props.page}
        kind="run"
        run={run}
        progressId="run-progress"
        doneUrl={`/studies/${studyId}`}
      />
      <p>
        <a href={`/studies/${studyId}`}>{tr.text('run.back')}</a>
      </p>
    </StudyPage>
  );
}
