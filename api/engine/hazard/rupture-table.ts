import { cellUsedAt } from '../geometry/cell-refinement.ts';
import { TECTONIC_SETTINGS } from '../model.ts';
import type { Mechanism, TectonicSetting } from '../model.ts';
import type { RuptureContext } from '../motion/types.ts';

/** Mechanisms by the codes of RuptureTable.mechanism. */
export const MECHANISMS: readonly Mechanism[] = ['strike-slip', 'reverse', 'normal'];

/** Numbers stored per plane in RuptureTable.planeCorners: the four corners' x, y, z (km). */
export const PLANE_STRIDE = 12;

/**
 * A study's ruptures laid out in typed arrays, one entry per rupture in discretisation order:
 * the fast path reads them in sequence, and the whole table is plain data that crosses to a
 * worker thread by structured clone (model.ts's Study does too) with no Rupture objects built.
 * Units as in Rupture: rates per year, km in the study's local frame, degrees.
 */
export interface RuptureTable {
  readonly count: number;
  readonly annualRate: Float64Array;
  readonly magnitude: Float64Array;
  readonly rakeDeg: Float64Array;
  readonly dipDeg: Float64Array;
  readonly ztorKm: Float64Array;
  readonly widthKm: Float64Array;
  readonly hypoDepthKm: Float64Array;
  /** Index into TECTONIC_SETTINGS. */
  readonly setting: Uint8Array;
  /** Index into MECHANISMS. */
  readonly mechanism: Uint8Array;
  readonly sourceIndex: Int32Array;
  /** Source id by source index. */
  readonly sourceIds: readonly string[];
  /** Hypocentre x, y, z of rupture i at 3i .. 3i + 2. */
  readonly hypocentre: Float64Array;
  /** Planes of rupture i are planeStart[i] .. planeStart[i + 1] − 1; a point rupture has none. */
  readonly planeStart: Int32Array;
  /**
   * Planes planeStart[i] .. traceEnd[i] − 1 make rupture i's top row, whose top edges are its
   * trace for GC2 (all its planes but on a contoured fault's mesh).
   */
  readonly traceEnd: Int32Array;
  /** PLANE_STRIDE numbers per plane: corners in RupturePlane order, x, y, z each. */
  readonly planeCorners: Float64Array;
  /** 1 where the rupture is a point (zone cell or point source), 0 where it is planar. */
  readonly isPoint: Uint8Array;
  /**
   * Which sites use rupture i (geometry/cell-refinement.ts): 0 every site; 1 sites farther than
   * cellRadiusKm[i] from the coarse cell's centre; 2 sites within it.
   */
  readonly cellRule: Uint8Array;
  /** The coarse cell's centre x, y of rupture i at 2i, 2i + 1 (rules 1 and 2). */
  readonly cellCentre: Float64Array;
  readonly cellRadiusKm: Float64Array;
}

/** Whether rupture i of `table` counts at the site (x, y), local km. */
export function ruptureUsedAt(table: RuptureTable, i: number, x: number, y: number): boolean {
  const rule = table.cellRule[i];
  if (rule === 0) return true;
  return cellUsedAt(
    rule === 2,
    table.cellCentre[2 * i] as number,
    table.cellCentre[2 * i + 1] as number,
    table.cellRadiusKm[i] as number,
    x,
    y,
  );
}

/** Indices of the ruptures of one setting, in table order. */
export function settingRuptures(table: RuptureTable, setting: TectonicSetting): Int32Array {
  const code = TECTONIC_SETTINGS.indexOf(setting);
  let count = 0;
  for (let i = 0; i < table.count; i++) if (table.setting[i] === code) count++;
  const kept = new Int32Array(count);
  for (let i = 0, k = 0; i < table.count; i++) if (table.setting[i] === code) kept[k++] = i;
  return kept;
}

/**
 * The distinct rupture contexts of the listed ruptures, for the ground-motion models, and the
 * place of each listed rupture among them. Many ruptures share one — every cell of a zone at one
 * magnitude and depth, every position along strike of a floating rupture — so a model's work on
 * the rupture alone is done once per context, not once per rupture.
 */
export interface DistinctContexts {
  readonly contexts: readonly RuptureContext[];
  /** contextOf[k] is the index in `contexts` of the rupture indices[k]. */
  readonly contextOf: Int32Array;
}

export function distinctContexts(table: RuptureTable, indices: Int32Array): DistinctContexts {
  const contexts: RuptureContext[] = [];
  const contextOf = new Int32Array(indices.length);
  const seen = new Map<string, number>();
  indices.forEach((i, k) => {
    // Neighbours in the table mostly share a context (a zone's cells in turn): no key for those.
    if (k > 0 && sameContext(table, i, indices[k - 1] as number)) {
      contextOf[k] = contextOf[k - 1] as number;
      return;
    }
    const key = contextKey(table, i);
    let at = seen.get(key);
    if (at === undefined) {
      at = contexts.push(contextAt(table, i)) - 1;
      seen.set(key, at);
    }
    contextOf[k] = at;
  });
  return { contexts, contextOf };
}

/** Whether ruptures i and j have every number of their contexts equal (as their keys would be). */
const sameContext = (table: RuptureTable, i: number, j: number): boolean =>
  Object.is(table.magnitude[i], table.magnitude[j]) &&
  Object.is(table.rakeDeg[i], table.rakeDeg[j]) &&
  table.mechanism[i] === table.mechanism[j] &&
  table.setting[i] === table.setting[j] &&
  Object.is(table.dipDeg[i], table.dipDeg[j]) &&
  Object.is(table.ztorKm[i], table.ztorKm[j]) &&
  Object.is(table.widthKm[i], table.widthKm[j]) &&
  Object.is(table.hypoDepthKm[i], table.hypoDepthKm[j]);

/** Every number of rupture i's context, exactly (String keeps every bit of a double). */
const contextKey = (table: RuptureTable, i: number): string =>
  `${table.magnitude[i]}|${table.rakeDeg[i]}|${table.mechanism[i]}|${table.setting[i]}|` +
  `${table.dipDeg[i]}|${table.ztorKm[i]}|${table.widthKm[i]}|${table.hypoDepthKm[i]}`;

function contextAt(table: RuptureTable, i: number): RuptureContext {
  return {
    magnitude: table.magnitude[i] as number,
    rakeDeg: table.rakeDeg[i] as number,
    mechanism: MECHANISMS[table.mechanism[i] as number] as Mechanism,
    setting: TECTONIC_SETTINGS[table.setting[i] as number] as TectonicSetting,
    dipDeg: table.dipDeg[i] as number,
    ztorKm: table.ztorKm[i] as number,
    widthKm: table.widthKm[i] as number,
    hypoDepthKm: table.hypoDepthKm[i] as number,
  };
}
