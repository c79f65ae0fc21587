import { measureUnit, parseMeasure } from '../../api/engine/motion/measure.ts';
import type { MapRunRecord } from '../../api/store/index.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { RunStatus } from './run-status.tsx';
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
      <RunStatus
        page={props.page}
        kind="mapRun"
        run={run}
        progressId="map-run-progress"
        statusUrl={`/api/maps/${run.id}`}
        doneUrl={doneUrl}
      />
      <p>
        <a href={`/studies/${studyId}`}>{tr.text('mapRun.back')}</a>
      </p>
    </StudyPage>
  );
}
