export { defaultPoolSize, WorkerPool, type PoolStats, type TaskEvents, type TaskHandle, type WorkerPoolOptions } from './worker-pool.ts';
export { PoolClosed, WorkerCrashed, WorkerFailure } from './task-errors.ts';
export type { MeasureOutput, ScenarioOutput, ScreenOutput, TaskKind, WorkerTask } from './messages.ts';
