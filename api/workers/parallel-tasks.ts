import { Cancelled } from '../engine/errors.ts';
import {
  hazardMapChunk,
  planHazardMap,
  type HazardMapPlan,
  type MapValidity,
} from '../engine/map/hazard-map.ts';
import { modelCatalog } from '../engine/motion/registry.ts';
import { screenCommunities } from '../engine/screen-study.ts';
import { planScreening, type ScreeningPlan } from '../engine/screening-plan.ts';
import type { TaskOutputs, WorkerTask } from './messages.ts';

/**
 * The worker side of the parallel runners (parallel-screen.ts, parallel-map.ts): a chunk of
 * communities or map points, computed from the plan of its run. Building a plan (the models'
 * precomputation over every rupture) costs far more than a chunk's message, so each thread
 * keeps the plans of the last few runs it served, by the run's planKey.
 */
const KEPT_PLANS = 2;

/** Plans this thread built, most recent last (module state of a worker thread, not of the engine). */
const plans = new Map<string, ScreeningPlan | HazardMapPlan>();

function keptPlan<T extends ScreeningPlan | HazardMapPlan>(key: string, build: () => T): T {
  let plan = plans.get(key) as T | undefined;
  if (plan) {
    plans.delete(key);
  } else {
    plan = build();
    while (plans.size >= KEPT_PLANS) plans.delete(plans.keys().next().value as string);
  }
  plans.set(key, plan);
  return plan;
}

export interface ChunkEvents {
  readonly shouldStop: () => boolean;
  readonly onProgress: (shareDone: number) => void;
}

export function screenCommunitiesTask(
  task: Extract<WorkerTask, { kind: 'screen-communities' }>,
  events: ChunkEvents,
): TaskOutputs['screen-communities'] {
  const plan = keptPlan(`screen:${task.planKey}`, () =>
    planScreening(task.study, { models: modelCatalog, table: task.table }),
  );
  const results = screenCommunities(plan, task.indices, {
    onProgress: (share) => {
      events.onProgress(share);
      if (share < 1 && events.shouldStop()) throw new Cancelled(share);
    },
  });
  return { communitiesJson: JSON.stringify(results) };
}

export function mapPointsTask(
  task: Extract<WorkerTask, { kind: 'map-points' }>,
  events: ChunkEvents,
): TaskOutputs['map-points'] {
  const plan = keptPlan(`map:${task.planKey}`, () =>
    planHazardMap(task.study, { ...task.map, models: modelCatalog, table: task.table }),
  );
  const validity: MapValidity = new Map();
  const points = hazardMapChunk(plan, task.firstIndex, task.count, validity, events.shouldStop);
  events.onProgress(1);
  return { points, validity: [...validity.entries()] };
}
