import type { RunRecord } from '../../api/store/index.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';

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
  const unfinished = run.status === 'queued' || run.status === 'running';
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: props.studyName }}
      titleKey="run.title"
    >
      <div
        class="run-status"
        data-run={run.id}
        data-status={run.status}
        data-done-url={`/studies/${studyId}`}
      >
        {unfinished ? (
          <>
            <p class="run-state" aria-live="polite">
              {tr.text(run.status === 'queued' ? 'run.queued' : 'run.running')}
            </p>
            <p>
              <label for="run-progress">{tr.text('run.progress')}</label>{' '}
              <progress id="run-progress" max={1} value={run.progress}>
                {Math.round(run.progress * 100)}%
              </progress>{' '}
              <span class="run-percent">{Math.round(run.progress * 100)}%</span>
            </p>
            <p class="run-refresh">
              <a href={props.page.path}>{tr.text('run.refresh')}</a>
            </p>
          </>
        ) : run.status === 'done' ? (
          <p>
            {tr.text('run.done')} <a href={`/studies/${studyId}`}>{tr.text('run.see')}</a>
          </p>
        ) : (
          <p class="problem">
            {tr.text('run.failed', { error: tr.english(run.error ?? run.status) })}
          </p>
        )}
      </div>
      <p>
        <a href={`/studies/${studyId}`}>{tr.text('run.back')}</a>
      </p>
    </StudyPage>
  );
}
