import { parentPort } from 'node:worker_threads';
import { modelCatalog } from '../engine/motion/registry.ts';
import type { StudyResult } from '../engine/results.ts';
import { buildProvenance } from '../results/provenance.ts';
import { runScenario } from '../engine/scenario/index.ts';
import { screenStudy } from '../engine/screen-study.ts';
import type { TaskMessage, TaskOutputs, WorkerReply, WorkerTask } from './messages.ts';
import { mapPointsTask, screenCommunitiesTask, type ChunkEvents } from './parallel-tasks.ts';
import { shareTable } from './shared-table.ts';
import { ruptureWork } from '../engine/hazard/rupture-work.ts';
import { studyRuptureTable } from '../engine/hazard/study-rupture-table.ts';
import { serialiseError } from './task-errors.ts';

/**
 * The worker thread of the pool (worker-pool.ts): runs one task at a time, synchronously, and
 * answers with messages. The engine polls `shouldStop`, which reads the task's shared stop
 * flag: a message could not arrive while the engine holds this thread.
 */

if (!parentPort)
  throw new Error(
    'run-worker.ts runs as a worker thread of worker-pool.ts; expected a parent port',
  );
const port = parentPort;

/** Progress is posted when it has moved by this share (1%) since the last post, and at the end. */
const PROGRESS_STEP = 0.01;

const reply = (message: WorkerReply): void => port.postMessage(message);

function screen(
  task: Extract<WorkerTask, { kind: 'screen' }>,
  id: number,
  stop: Int32Array,
): TaskOutputs['screen'] {
  let posted = 0;
  const startedAt = new Date().toISOString();
  const output = screenStudy(task.study, {
    models: modelCatalog,
    shouldStop: () => Atomics.load(stop, 0) === 1,
    onProgress: (shareDone) => {
      if (shareDone - posted >= PROGRESS_STEP || (shareDone >= 1 && posted < 1)) {
        posted = shareDone;
        reply({ type: 'progress', id, shareDone });
      }
    },
  });
  const provenance = buildProvenance({
    study: task.study,
    toolVersion: task.toolVersion,
    inputHash: task.inputHash,
    startedAt,
    finishedAt: new Date().toISOString(),
  });
  const result: StudyResult = { ...output, provenance };
  return { resultsJson: JSON.stringify(result), provenance };
}

function perform(message: TaskMessage): TaskOutputs[WorkerTask['kind']] {
  const { id, task, stop } = message;
  switch (task.kind) {
    case 'screen':
      return screen(task, id, stop);
    case 'measure': {
      const { frame, table } = studyRuptureTable(task.study);
      return ruptureWork(task.study, table, frame);
    }
    case 'scenario':
      return { resultJson: JSON.stringify(runScenario(task.study, modelCatalog, task.request)) };
    case 'rupture-table':
      return { table: shareTable(studyRuptureTable(task.study, task.sources).table) };
    case 'screen-communities':
      return screenCommunitiesTask(task, chunkEvents(id, stop));
    case 'map-points':
      return mapPointsTask(task, chunkEvents(id, stop));
  }
}

/** A chunk's stop flag and progress, posted like a screening's (at most every PROGRESS_STEP). */
function chunkEvents(id: number, stop: Int32Array): ChunkEvents {
  let posted = 0;
  return {
    shouldStop: () => Atomics.load(stop, 0) === 1,
    onProgress: (shareDone) => {
      if (shareDone - posted >= PROGRESS_STEP || (shareDone >= 1 && posted < 1)) {
        posted = shareDone;
        reply({ type: 'progress', id, shareDone });
      }
    },
  };
}

port.on('message', (message: TaskMessage) => {
  reply({ type: 'started', id: message.id, at: new Date().toISOString() });
  try {
    reply({ type: 'done', id: message.id, output: perform(message) });
  } catch (error) {
    reply({ type: 'failed', id: message.id, error: serialiseError(error) });
  }
});

reply({ type: 'ready' });
