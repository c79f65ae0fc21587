import { TremoraError } from '../errors.ts';
import { TECTONIC_SETTINGS } from '../model.ts';
import type { PointKm, Rupture, RupturePlane } from '../ruptures/rupture.ts';
import { MECHANISMS, PLANE_STRIDE, type RuptureTable } from './rupture-table.ts';
import { RUPTURE_NUMBERS } from '../motion/types.ts';

/** What the table keeps of a rupture, its rate aside (a Rupture, or a placed one with its share). */
export type TableRupture = Pick<
  Rupture,
  'sourceIndex' | 'sourceId' | 'context' | 'surface' | 'cellUse'
>;

/** Ruptures (and planes) the columns first have room for; they double as needed. */
const FIRST_CAPACITY = 4096;

type Column = Float64Array | Int32Array | Uint8Array;

function grown<T extends Column>(column: T, length: number): T {
  const Kind = column.constructor as { new (length: number): T };
  const copy = new Kind(length);
  copy.set(column);
  return copy;
}

const trimmed = <T extends Column>(column: T, length: number): T => column.slice(0, length) as T;

/**
 * A RuptureTable's columns while they fill, one rupture at a time in discretisation order:
 * rupture i at i, plane p's corners from PLANE_STRIDE × p; the columns double as needed.
 * Both ways to a table (ruptureTable from Rupture objects, studyRuptureTable from the sources'
 * walk) fill one of these, so they give the same table.
 */
export class RuptureTableBuilder {
  count = 0;
  planes = 0;
  capacity = FIRST_CAPACITY;
  planeCapacity = FIRST_CAPACITY;
  annualRate = new Float64Array(FIRST_CAPACITY);
  magnitude = new Float64Array(FIRST_CAPACITY);
  rakeDeg = new Float64Array(FIRST_CAPACITY);
  dipDeg = new Float64Array(FIRST_CAPACITY);
  ztorKm = new Float64Array(FIRST_CAPACITY);
  widthKm = new Float64Array(FIRST_CAPACITY);
  hypoDepthKm = new Float64Array(FIRST_CAPACITY);
  setting = new Uint8Array(FIRST_CAPACITY);
  mechanism = new Uint8Array(FIRST_CAPACITY);
  sourceIndex = new Int32Array(FIRST_CAPACITY);
  hypocentre = new Float64Array(3 * FIRST_CAPACITY);
  planeStart = new Int32Array(FIRST_CAPACITY + 1);
  traceEnd = new Int32Array(FIRST_CAPACITY);
  isPoint = new Uint8Array(FIRST_CAPACITY);
  cellRule = new Uint8Array(FIRST_CAPACITY);
  cellCentre = new Float64Array(2 * FIRST_CAPACITY);
  cellRadiusKm = new Float64Array(FIRST_CAPACITY);
  planeCorners = new Float64Array(PLANE_STRIDE * FIRST_CAPACITY);
  /** Source id by source index; a source without ruptures keeps '' (dense, for structured clone). */
  readonly sourceIds: string[] = [];

  private grow(): void {
    const capacity = (this.capacity *= 2);
    this.annualRate = grown(this.annualRate, capacity);
    this.magnitude = grown(this.magnitude, capacity);
    this.rakeDeg = grown(this.rakeDeg, capacity);
    this.dipDeg = grown(this.dipDeg, capacity);
    this.ztorKm = grown(this.ztorKm, capacity);
    this.widthKm = grown(this.widthKm, capacity);
    this.hypoDepthKm = grown(this.hypoDepthKm, capacity);
    this.setting = grown(this.setting, capacity);
    this.mechanism = grown(this.mechanism, capacity);
    this.sourceIndex = grown(this.sourceIndex, capacity);
    this.hypocentre = grown(this.hypocentre, 3 * capacity);
    this.planeStart = grown(this.planeStart, capacity + 1);
    this.traceEnd = grown(this.traceEnd, capacity);
    this.isPoint = grown(this.isPoint, capacity);
    this.cellRule = grown(this.cellRule, capacity);
    this.cellCentre = grown(this.cellCentre, 2 * capacity);
    this.cellRadiusKm = grown(this.cellRadiusKm, capacity);
  }

  /** Appends one rupture with its annual rate (per year). */
  add(rupture: TableRupture, annualRate: number): void {
    if (this.count === this.capacity) this.grow();
    const i = this.count++;
    const c = rupture.context;
    this.annualRate[i] = annualRate;
    this.magnitude[i] = c.magnitude;
    this.rakeDeg[i] = c.rakeDeg;
    this.dipDeg[i] = c.dipDeg;
    this.ztorKm[i] = c.ztorKm;
    this.widthKm[i] = c.widthKm;
    this.hypoDepthKm[i] = c.hypoDepthKm;
    this.setting[i] = TECTONIC_SETTINGS.indexOf(c.setting);
    this.mechanism[i] = MECHANISMS.indexOf(c.mechanism);
    this.sourceIndex[i] = rupture.sourceIndex;
    while (this.sourceIds.length <= rupture.sourceIndex) this.sourceIds.push('');
    this.sourceIds[rupture.sourceIndex] = rupture.sourceId;
    const { surface } = rupture;
    const h = surface.hypocentre;
    this.hypocentre[3 * i] = h.x;
    this.hypocentre[3 * i + 1] = h.y;
    this.hypocentre[3 * i + 2] = h.z;
    this.planeStart[i] = this.planes;
    this.traceEnd[i] = this.planes;
    const use = rupture.cellUse;
    if (use) {
      this.cellRule[i] = use.near ? 2 : 1;
      this.cellCentre[2 * i] = use.centre.x;
      this.cellCentre[2 * i + 1] = use.centre.y;
      this.cellRadiusKm[i] = use.radiusKm;
    }
    if (surface.kind !== 'planes') {
      this.isPoint[i] = 1;
      return;
    }
    const planes = surface.planes;
    if (planes.length === 0)
      throw new TremoraError(
        `a planar rupture surface needs at least one plane, got none (rupture ${i} of source "${rupture.sourceId}")`,
      );
    while (this.planes + planes.length > this.planeCapacity) {
      this.planeCapacity *= 2;
      this.planeCorners = grown(this.planeCorners, PLANE_STRIDE * this.planeCapacity);
    }
    const corners = this.planeCorners;
    let at = this.planes * PLANE_STRIDE;
    for (let p = 0; p < planes.length; p++) {
      const q = (planes[p] as RupturePlane).corners;
      for (let k = 0; k < 4; k++) {
        const corner = q[k] as PointKm;
        corners[at++] = corner.x;
        corners[at++] = corner.y;
        corners[at++] = corner.z;
      }
    }
    this.traceEnd[i] = this.planes + (surface.tracePlanes ?? planes.length);
    this.planes += planes.length;
  }

  table(): RuptureTable {
    const { count, planes } = this;
    this.planeStart[count] = planes;
    return {
      count,
      annualRate: trimmed(this.annualRate, count),
      magnitude: trimmed(this.magnitude, count),
      rakeDeg: trimmed(this.rakeDeg, count),
      dipDeg: trimmed(this.dipDeg, count),
      ztorKm: trimmed(this.ztorKm, count),
      widthKm: trimmed(this.widthKm, count),
      hypoDepthKm: trimmed(this.hypoDepthKm, count),
      setting: trimmed(this.setting, count),
      mechanism: trimmed(this.mechanism, count),
      sourceIndex: trimmed(this.sourceIndex, count),
      sourceIds: this.sourceIds,
      hypocentre: trimmed(this.hypocentre, 3 * count),
      planeStart: trimmed(this.planeStart, count + 1),
      traceEnd: trimmed(this.traceEnd, count),
      planeCorners: trimmed(this.planeCorners, PLANE_STRIDE * planes),
      isPoint: trimmed(this.isPoint, count),
      cellRule: trimmed(this.cellRule, count),
      cellCentre: trimmed(this.cellCentre, 2 * count),
      cellRadiusKm: trimmed(this.cellRadiusKm, count),
    };
  }
}

/** Lays out `ruptures` (as discretiseStudy gives them) in a RuptureTable. */
export function ruptureTable(ruptures: readonly Rupture[]): RuptureTable {
  const builder = new RuptureTableBuilder();
  for (const r of ruptures) builder.add(r, r.annualRate);
  return builder.table();
}

type ColumnName = {
  [K in keyof RuptureTable]: RuptureTable[K] extends Column ? K : never;
}[keyof RuptureTable];

/** Columns copied part after part as they are; planeStart and traceEnd are offset by the planes before. */
const PLAIN_COLUMNS = [
  'annualRate',
  ...RUPTURE_NUMBERS,
  'setting',
  'mechanism',
  'sourceIndex',
  'hypocentre',
  'planeCorners',
  'isPoint',
  'cellRule',
  'cellCentre',
  'cellRadiusKm',
] as const satisfies readonly ColumnName[];

/**
 * The tables of consecutive parts of a study's sources (studyRuptureTable with a SourceRange),
 * joined in order into the table of all of them: the same columns, rupture by rupture, as the
 * whole study's walk. `memory` gives each column's bytes (shared memory, say); plain by default.
 */
export function joinRuptureTables(
  parts: readonly RuptureTable[],
  memory: (bytes: number) => ArrayBufferLike = (bytes) => new ArrayBuffer(bytes),
): RuptureTable {
  const column = <T extends Column>(of: (t: RuptureTable) => T, length: number): T => {
    const Kind = of(parts[0]!).constructor as {
      new (buffer: ArrayBufferLike): T;
      readonly BYTES_PER_ELEMENT: number;
    };
    return new Kind(memory(length * Kind.BYTES_PER_ELEMENT));
  };
  const count = parts.reduce((n, t) => n + t.count, 0);
  const planes = parts.reduce((n, t) => n + (t.planeStart[t.count] as number), 0);
  const plain = Object.fromEntries(
    PLAIN_COLUMNS.map((name) => {
      const out = column(
        (t) => t[name],
        parts.reduce((n, t) => n + t[name].length, 0),
      );
      let at = 0;
      for (const t of parts) {
        out.set(t[name] as never, at);
        at += t[name].length;
      }
      return [name, out];
    }),
  ) as Pick<RuptureTable, (typeof PLAIN_COLUMNS)[number]>;
  const planeStart = column((t) => t.planeStart, count + 1);
  const traceEnd = column((t) => t.traceEnd, count);
  let first = 0;
  let planesBefore = 0;
  for (const t of parts) {
    for (let i = 0; i < t.count; i++) {
      planeStart[first + i] = (t.planeStart[i] as number) + planesBefore;
      traceEnd[first + i] = (t.traceEnd[i] as number) + planesBefore;
    }
    first += t.count;
    planesBefore += t.planeStart[t.count] as number;
  }
  planeStart[count] = planes;
  const sourceIds = Array.from(
    { length: Math.max(0, ...parts.map((t) => t.sourceIds.length)) },
    (_, s) => parts.find((t) => t.sourceIds[s])?.sourceIds[s] ?? '',
  );
  return { count, ...plain, sourceIds, planeStart, traceEnd };
}
