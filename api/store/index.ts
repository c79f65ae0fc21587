export { DEFAULT_DATABASE_PATH, openStore, type Store } from './store.ts';
export { migrate, readMigrations, MIGRATIONS_DIR, type Migration, type MigrationOutcome } from './migrate.ts';
export { StudyRepository, type StudyFile, type StudyFileKind, type StudyRecord, type StudySummary, type StudyWrite } from './study-repository.ts';
export {
  FINISHED_STATUSES,
  INTERRUPTED_MESSAGE,
  isFinished,
  RunRepository,
  type RunInputs,
  type RunOutputs,
  type RunRecord,
  type RunStatus,
} from './run-repository.ts';
export { MapRunRepository, type MapRunInputs, type MapRunOutputs, type MapRunRecord, type MapRunRequest } from './map-run-repository.ts';
export { newId } from './new-id.ts';
export { CatalogRepository, type StudyCatalogRecord, type StudyCatalogWrite } from './catalog-repository.ts';
export { DatabaseRefused, TREMORA_APPLICATION_ID, isDamaged, isDiskFull } from './database-file.ts';
