import type { Database, Statement } from 'better-sqlite3';
import type { MapQuantity } from '../engine/map/hazard-map.ts';
import type { MapDescription } from '../engine/map/map-geojson.ts';
import type { LonLatBounds } from '../engine/map/map-grid.ts';
import { newId } from './new-id.ts';
import { JOB_COLUMNS, type JobRecord, type JobRow, JobTable, jobRecordOf } from './job-table.ts';

/** What a map run maps: as asked, with the Vs30 it gives every point filled in. */
export interface MapRunRequest {
  /** "PGA", "PGV" or "SA(T)". */
  readonly measure: string;
  readonly quantity: MapQuantity;
  readonly spacingKm: number;
  /** Vs30 of every grid point, m/s. */
  readonly vs30: number;
  /** The box mapped, degrees; absent for the study area. */
  readonly bounds?: LonLatBounds;
}

/** A map run without its GeoJSON (which can be large; read it with `geojson`). */
export interface MapRunRecord extends JobRecord {
  readonly request: MapRunRequest;
  /** What the map is of and its grid, once the grid is known (status running and after). */
  readonly description: MapDescription | null;
  /** The map's warnings, once it is done; empty before. */
  readonly warnings: readonly string[];
}

export interface MapRunInputs {
  readonly studyId: string;
  readonly request: MapRunRequest;
  readonly inputHash: string;
}

export interface MapRunOutputs {
  /** The whole FeatureCollection (map-geojson.ts), as text. */
  readonly geojson: string;
  readonly warnings: readonly string[];
  readonly provenanceJson: string;
  readonly finishedAt: string;
}

interface MapRunRow extends JobRow {
  measure: string;
  return_period_years: number | null;
  level: number | null;
  horizon_years: number | null;
  spacing_km: number;
  vs30: number;
  bounds: string | null;
  description: string | null;
  warnings: string | null;
}

const MAP_RUN_COLUMNS = `${JOB_COLUMNS}, measure, return_period_years, level, horizon_years, spacing_km, vs30, bounds, description, warnings`;

function requestOf(row: MapRunRow): MapRunRequest {
  const quantity: MapQuantity =
    row.return_period_years !== null
      ? { kind: 'return-period', returnPeriodYears: row.return_period_years }
      : { kind: 'chance', level: row.level as number, horizonYears: row.horizon_years as number };
  const base = { measure: row.measure, quantity, spacingKm: row.spacing_km, vs30: row.vs30 };
  return row.bounds === null ? base : { ...base, bounds: JSON.parse(row.bounds) as LonLatBounds };
}

const recordOf = (row: MapRunRow): MapRunRecord => ({
  ...jobRecordOf(row),
  request: requestOf(row),
  description: row.description === null ? null : (JSON.parse(row.description) as MapDescription),
  warnings: row.warnings === null ? [] : (JSON.parse(row.warnings) as string[]),
});

/** Hazard-map runs and their GeoJSON; what only unfinished map runs may change is JobTable's. */
export class MapRunRepository extends JobTable {
  readonly #get: Statement;
  readonly #geojson: Statement;
  readonly #listForStudy: Statement;
  readonly #insert: Statement;
  readonly #markRunning: Statement;
  readonly #finishDone: Statement;

  constructor(db: Database) {
    super(db, 'map_runs');
    this.#get = db.prepare(`SELECT ${MAP_RUN_COLUMNS} FROM map_runs WHERE id = ?`);
    this.#geojson = db.prepare("SELECT geojson FROM map_runs WHERE id = ? AND status = 'done'");
    // rowid keeps the order of creation among runs created in the same millisecond.
    this.#listForStudy = db.prepare(
      `SELECT ${MAP_RUN_COLUMNS} FROM map_runs WHERE study_id = ? ORDER BY created_at, rowid`,
    );
    this.#insert = db.prepare(
      `INSERT INTO map_runs (id, study_id, status, progress, measure, return_period_years, level, horizon_years, spacing_km, vs30, bounds, input_hash, created_at)
       VALUES (?, ?, 'queued', 0, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
    );
    this.#markRunning = db.prepare(
      "UPDATE map_runs SET status = 'running', started_at = ?, description = ? WHERE id = ? AND status = 'queued'",
    );
    this.#finishDone = db.prepare(
      "UPDATE map_runs SET status = 'done', progress = 1, geojson = ?, warnings = ?, provenance = ?, finished_at = ?, error = NULL WHERE id = ? AND status = 'running'",
    );
  }

  /** Records a new map run, queued. */
  create(inputs: MapRunInputs): MapRunRecord {
    const id = newId();
    const { request } = inputs;
    const q = request.quantity;
    this.#insert.run(
      id,
      inputs.studyId,
      request.measure,
      q.kind === 'return-period' ? q.returnPeriodYears : null,
      q.kind === 'chance' ? q.level : null,
      q.kind === 'chance' ? q.horizonYears : null,
      request.spacingKm,
      request.vs30,
      request.bounds === undefined ? null : JSON.stringify(request.bounds),
      inputs.inputHash,
      new Date().toISOString(),
    );
    return this.get(id) as MapRunRecord;
  }

  get(id: string): MapRunRecord | undefined {
    const row = this.#get.get(id) as MapRunRow | undefined;
    return row ? recordOf(row) : undefined;
  }

  /** The GeoJSON text of a done map run; undefined for any other. */
  geojson(id: string): string | undefined {
    return (this.#geojson.get(id) as { geojson: string } | undefined)?.geojson;
  }

  /** The study's map runs, oldest first. */
  listForStudy(studyId: string): MapRunRecord[] {
    return (this.#listForStudy.all(studyId) as MapRunRow[]).map(recordOf);
  }

  /** Queued to running, with what the map is of (known once its grid is laid out). */
  markRunning(id: string, startedAt: string, description: MapDescription): boolean {
    return this.#markRunning.run(startedAt, JSON.stringify(description), id).changes > 0;
  }

  /** GeoJSON, warnings, provenance and the status 'done' are written in one statement: never half a map. */
  finishDone(id: string, outputs: MapRunOutputs): boolean {
    return (
      this.#finishDone.run(
        outputs.geojson,
        JSON.stringify(outputs.warnings),
        outputs.provenanceJson,
        outputs.finishedAt,
        id,
      ).changes > 0
    );
  }
}
