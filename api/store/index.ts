export type { Store } from './store.ts';
export type { StudyRecord, StudySummary } from './study-repository.ts';
export {
  INTERRUPTED_MESSAGE,
  isFinished,
  type RunOutputs,
  type RunRecord,
} from './run-repository.ts';
export type { MapRunOutputs, MapRunRecord, MapRunRequest } from './map-run-repository.ts';
export { isDamaged, isDiskFull } from './database-file.ts';
