import type { MapDescription } from '../engine/map/map-geojson.ts';
import {
  INTERRUPTED_MESSAGE,
  type MapRunOutputs,
  type RunOutputs,
  type Store,
} from '../store/index.ts';
import type { JobLedger } from './job-ledger.ts';

/**
 * The store as the ledger of each kind of job: the only place jobs meet the store, so the
 * computation (api/workers) never imports it.
 */
export function runLedger(store: Store): JobLedger<void, RunOutputs> {
  const runs = store.runs;
  return {
    markRunning: (id, startedAt) => runs.markRunning(id, startedAt),
    setProgress: (id, share) => runs.setProgress(id, share),
    finishDone: (id, done) => runs.finishDone(id, done),
    finishWithout: (id, end, message) => runs.finishWithout(id, end, message),
    interruptedMessage: INTERRUPTED_MESSAGE,
  };
}

export function mapLedger(store: Store): JobLedger<MapDescription, MapRunOutputs> {
  const maps = store.maps;
  return {
    markRunning: (id, startedAt, description) => maps.markRunning(id, startedAt, description),
    setProgress: (id, share) => maps.setProgress(id, share),
    finishDone: (id, done) => maps.finishDone(id, done),
    finishWithout: (id, end, message) => maps.finishWithout(id, end, message),
    interruptedMessage: INTERRUPTED_MESSAGE,
  };
}
