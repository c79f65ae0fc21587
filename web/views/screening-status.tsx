import type { RunState } from '../data/study-data.ts';
import type { Translator } from '../text/translator.ts';

/** Where the study's screening stands, with the button that starts one (a plain form post). */
export function ScreeningStatus(props: { readonly tr: Translator; readonly studyId: string; readonly runs: RunState; readonly problem?: string }) {
  const { tr, runs, studyId } = props;
  const latest = runs.latest;
  const screening = runs.screening;
  const running = latest && (latest.status === 'queued' || latest.status === 'running');
  const failed = latest && (latest.status === 'failed' || latest.status === 'interrupted' || latest.status === 'cancelled') && latest.id !== screening?.run.id;
  const button = (label: string) => (
    <form method="post" action={`/studies/${studyId}/screen`} class="inline-form">
      <button type="submit" class="button-primary">
        {label}
      </button>
    </form>
  );
  return (
    <section class="status-box" aria-label={tr.t('overview.screenButton')}>
      {props.problem && (
        <p class="problem" role="alert">
          {props.problem}
        </p>
      )}
      {running ? (
        <p>
          {tr.t('overview.running', { percent: Math.round(latest.progress * 100) })}{' '}
          <a href={`/studies/${studyId}/runs/${latest.id}`}>{tr.t('overview.runningLink')}</a>
        </p>
      ) : screening ? (
        <>
          <p>{tr.t('overview.screenedOn', { date: tr.date(screening.run.finishedAt ?? screening.run.createdAt) })}</p>
          {failed && <p class="problem">{tr.t('overview.lastFailed', { error: latest.error ?? latest.status })}</p>}
          {!screening.current && <p class="notice">{tr.t('overview.stale')}</p>}
          {button(tr.t('overview.screenAgain'))}
        </>
      ) : (
        <>
          <p>{tr.t('overview.notScreened')}</p>
          {failed && <p class="problem">{tr.t('overview.lastFailed', { error: latest.error ?? latest.status })}</p>}
          {button(tr.t('overview.screenButton'))}
        </>
      )}
    </section>
  );
}
