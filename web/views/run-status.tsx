import type { PageContext } from '../layout/page-shell.tsx';

/** The texts of one kind of run: `<kind>.queued`, `.running`, `.progress`, `.refresh`, ... */
type RunKind = 'run' | 'mapRun';

export interface RunStatusProps {
  readonly page: PageContext;
  readonly kind: RunKind;
  readonly run: {
    readonly id: string;
    readonly status: string;
    readonly progress: number;
    readonly error: string | null;
  };
  /** The id of the progress bar, which its label names. */
  readonly progressId: string;
  /** Where the script follows the run (the API), when it is not the run's own address. */
  readonly statusUrl?: string;
  /** Where the finished run is seen. */
  readonly doneUrl: string;
}

/**
 * How far a run has got: queued or running with a progress bar and a way to refresh (the
 * script, static/tremora.js, follows the run and moves to `doneUrl` itself), done with a link
 * to its result, or failed with its error.
 */
export function RunStatus(props: RunStatusProps) {
  const { tr } = props.page;
  const { run, kind, progressId } = props;
  const unfinished = run.status === 'queued' || run.status === 'running';
  const percent = Math.round(run.progress * 100);
  return (
    <div
      class="run-status"
      data-run={run.id}
      data-status={run.status}
      data-status-url={props.statusUrl}
      data-done-url={props.doneUrl}
    >
      {unfinished ? (
        <>
          <p class="run-state" aria-live="polite">
            {tr.text(run.status === 'queued' ? `${kind}.queued` : `${kind}.running`)}
          </p>
          <p>
            <label for={progressId}>{tr.text(`${kind}.progress`)}</label>{' '}
            <progress id={progressId} max={1} value={run.progress}>
              {percent}%
            </progress>{' '}
            <span class="run-percent">{percent}%</span>
          </p>
          <p class="run-refresh">
            <a href={props.page.path}>{tr.text(`${kind}.refresh`)}</a>
          </p>
        </>
      ) : run.status === 'done' ? (
        <p>
          {tr.text(`${kind}.done`)} <a href={props.doneUrl}>{tr.text(`${kind}.see`)}</a>
        </p>
      ) : (
        <p class="problem">
          {tr.text(`${kind}.failed`, { error: tr.english(run.error ?? run.status) })}
        </p>
      )}
    </div>
  );
}
