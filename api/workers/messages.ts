import type { RuptureWork } from '../engine/hazard/rupture-work.ts';
import type { InputIssue } from '../engine/errors.ts';
import type { RuptureTable } from '../engine/hazard/rupture-table.ts';
import type { SourceRange } from '../engine/hazard/study-rupture-table.ts';
import type { HazardMapOptions, MapPoint } from '../engine/map/hazard-map.ts';
import type { Study } from '../engine/model.ts';
import type { Provenance } from '../engine/results.ts';
import type { ScenarioRequest } from '../engine/scenario/index.ts';

/**
 * What the service asks of a worker thread. Everything crosses by structured clone, so tasks
 * and outputs are plain data (a Study is plain data by design: model.ts).
 */
export type WorkerTask =
  /** Screen a study: results JSON text (provenance included) and the provenance. */
  | {
      readonly kind: 'screen';
      readonly study: Study;
      readonly inputHash: string;
      readonly toolVersion: string;
    }
  /** Count a study's ruptures, for the work budget, without screening it. */
  | { readonly kind: 'measure'; readonly study: Study }
  /** One deterministic scenario (engine/scenario), as JSON text. */
  | { readonly kind: 'scenario'; readonly study: Study; readonly request: ScenarioRequest }
  /**
   * A study's ruptures laid out as a table on shared memory, for the parallel runners to hand
   * out; with `sources`, only those sources' (a part, for joinRuptureTables).
   */
  | { readonly kind: 'rupture-table'; readonly study: Study; readonly sources?: SourceRange }
  /**
   * Some communities of a study, from the rupture table the runner built once
   * (parallel-screen.ts); `planKey` names the run, so a thread builds its plan once per run.
   */
  | {
      readonly kind: 'screen-communities';
      readonly planKey: string;
      readonly study: Study;
      readonly table: RuptureTable;
      readonly indices: readonly number[];
    }
  /** Points firstIndex .. firstIndex + count − 1 of a hazard map (parallel-map.ts). */
  | {
      readonly kind: 'map-points';
      readonly planKey: string;
      readonly study: Study;
      readonly table: RuptureTable;
      readonly map: MapRequest;
      readonly firstIndex: number;
      readonly count: number;
    };

/** What a map is of, as it crosses to a thread (the models are the registry's there). */
export type MapRequest = Omit<HazardMapOptions, 'models' | 'table'>;

export interface RuptureTableOutput {
  readonly table: RuptureTable;
}

export interface ScreenCommunitiesOutput {
  /** The communities' results as a JSON array, in the order asked for (text: cheap to pass on unparsed). */
  readonly communitiesJson: string;
}

export interface MapPointsOutput {
  readonly points: readonly MapPoint[];
  /** Per-model validity counts over these points. */
  readonly validity: readonly (readonly [
    model: string,
    counts: { outside: number; evaluated: number; firstNote: string },
  ])[];
}

export interface ScreenOutput {
  /** The StudyResult with its provenance, serialised in the worker to spare the service thread. */
  readonly resultsJson: string;
  readonly provenance: Provenance;
}

/** A study's ruptures, their planes beyond the first and their per-variant sums (engine/hazard/rupture-work.ts). */
export type MeasureOutput = RuptureWork;

export interface ScenarioOutput {
  readonly resultJson: string;
}

export interface TaskOutputs {
  readonly screen: ScreenOutput;
  readonly measure: MeasureOutput;
  readonly scenario: ScenarioOutput;
  readonly 'rupture-table': RuptureTableOutput;
  readonly 'screen-communities': ScreenCommunitiesOutput;
  readonly 'map-points': MapPointsOutput;
}

export type TaskKind = WorkerTask['kind'];

/** A task as posted to a worker: `stop` is a one-cell Int32Array on shared memory (1 = stop). */
export interface TaskMessage {
  readonly id: number;
  readonly task: WorkerTask;
  readonly stop: Int32Array;
}

/** An error as it crosses back from a worker: enough to rebuild the engine's named errors. */
export interface SerialisedError {
  readonly name: string;
  readonly message: string;
  /** True for the engine's own errors (TremoraError): the input was at fault, not the code. */
  readonly domain: boolean;
  readonly issues?: readonly InputIssue[];
  readonly size?: number;
  readonly budget?: number;
  readonly detail?: string;
  readonly shareDone?: number;
  readonly stack?: string;
}

export type WorkerReply =
  | { readonly type: 'ready' }
  | { readonly type: 'started'; readonly id: number; readonly at: string }
  | { readonly type: 'progress'; readonly id: number; readonly shareDone: number }
  | { readonly type: 'done'; readonly id: number; readonly output: TaskOutputs[TaskKind] }
  | { readonly type: 'failed'; readonly id: number; readonly error: SerialisedError };
