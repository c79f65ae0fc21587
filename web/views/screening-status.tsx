import type { Child } from 'hono/jsx';
import type { RunState } from '../data/study-data.ts';
import type { Translator } from '../text/translator.ts';

/** Where the study's screening stands, with the button that starts one (a plain form post). */
export function ScreeningStatus(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly runs: RunState;
  readonly problem?: string;
}) {
  const { tr, runs, studyId } = props;
  const latest = runs.latest;
  const screening = runs.screening;
  const running = latest && (latest.status === 'queued' || latest.status === 'running');
  const failed =
    latest &&
    (latest.status === 'failed' ||
      latest.status === 'interrupted' ||
      latest.status === 'cancelled') &&
    latest.id !== screening?.run.id;
  const button = (label: Child) => (
    <form method="post" action={`/studies/${studyId}/screen`} class="inline-form">
      <button type="submit" class="button-primary">
        {label}
      </button>
    </form>
  );
  return (
    <section class="status-box" aria-labelledby="status-box-name">
      {/* Named by a hidden element rather than aria-label, which cannot mark an English stand-in's language. */}
      <span id="status-box-name" hidden>
        {tr.text('overview.screenButton')}
      </span>
      {props.problem && (
        <p class="problem" role="alert">
          {tr.english(props.problem)}
        </p>
      )}
      {running ? (
        <p>
          {tr.text('overview.running', { percent: Math.round(latest.progress * 100) })}{' '}
          <a href={`/studies/${studyId}/runs/${latest.id}`}>{tr.text('overview.runningLink')}</a>
        </p>
      ) : screening ? (
        <>
          <p>
            {tr.text('overview.screenedOn', {
              date: tr.date(screening.run.finishedAt ?? screening.run.createdAt),
            })}
          </p>
          {failed && (
            <p class="problem">
              {tr.text('overview.lastFailed', { error: tr.english(latest.error ?? latest.status) })}
            </p>
          )}
          {!screening.current && <p class="notice">{tr.text('overview.stale')}</p>}
          {button(tr.text('overview.screenAgain'))}
        </>
      ) : (
        <>
          <p>{tr.text('overview.notScreened')}</p>
          {failed && (
            <p class="problem">
              {tr.text('overview.lastFailed', { error: tr.english(latest.error ?? latest.status) })}
            </p>
          )}
          {button(tr.text('overview.screenButton'))}
        </>
      )}
    </section>
  );
}
