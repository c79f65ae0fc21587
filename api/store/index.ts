export type { Store } from './store.ts';
export type { StudyRecord, StudySummary } from './study-repository.ts';
export { INTERRUPTED_MESSAGE, isFinished, type RunRecord } from './run-repository.ts';
export type { MapRunRecord, MapRunRequest } from './map-run-repository.ts';
