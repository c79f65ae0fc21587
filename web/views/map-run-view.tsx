import { measureUnit, parseMeasure } from '../../api/engine/motion/measure.ts';
import type { MapRunRecord } from '../../api/store/index.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { mapTitle } from '../maps/hazard-layer.tsx';

export interface MapRunViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  readonly run: MapRunRecord;
}

/**
 * A hazard map in progress, as the screening run page shows a run: without script the reader
 * refreshes the page; with script (static/tremora.js) the bar follows GET /api/maps/{id} and
 * the page moves to the overview's map when it is done.
 */
export function MapRunView(props: MapRunViewProps) {
  const { tr } = props.page;
  const { run, studyId } = props;
  const unfinished = run.status === 'queued' || run.status === 'running';
  const doneUrl = `/studies/${studyId}#map-heading`;
  const what = run.description ?? {
    measure: run.request.measure,
    unit: measureUnit(parseMeasure(run.request.measure)),
    quantity: run.request.quantity,
  };
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: props.studyName }}
      titleKey="mapRun.title"
    >
      <p>{mapTitle(tr, what)}</p>
      <div
        class="run-status"
        data-run={run.id}
        data-status={run.status}
        data-status-url={`/api/maps/${run.id}`}
        data-done-url={doneUrl}
      >
        {unfinished ? (
          <>
            <p class="run-state" aria-live="polite">
              {tr.text(run.status === 'queued' ? 'mapRun.queued' : 'mapRun.running')}
            </p>
            <p>
              <label for="map-run-progress">{tr.text('mapRun.progress')}</label>{' '}
              <progress id="map-run-progress" max={1} value={run.progress}>
                {Math.round(run.progress * 100)}%
              </progress>{' '}
              <span class="run-percent">{Math.round(run.progress * 100)}%</span>
            </p>
            <p class="run-refresh">
              <a href={props.page.path}>{tr.text('mapRun.refresh')}</a>
            </p>
          </>
        ) : run.status === 'done' ? (
          <p>
            {tr.text('mapRun.done')} <a href={doneUrl}>{tr.text('mapRun.see')}</a>
          </p>
        ) : (
          <p class="problem">
            {tr.text('mapRun.failed', { error: tr.english(run.error ?? run.status) })}
          </p>
        )}
      </div>
      <p>
        <a href={`/studies/${studyId}`}>{tr.text('mapRun.back')}</a>
      </p>
    </StudyPage>
  );
}
