import { TremoraError } from '../errors.ts';
import { TECTONIC_SETTINGS } from '../model.ts';
import type { Mechanism, TectonicSetting } from '../model.ts';
import type { RuptureContext } from '../motion/types.ts';
import type { Rupture } from '../ruptures/rupture.ts';

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
  /** PLANE_STRIDE numbers per plane: corners in RupturePlane order, x, y, z each. */
  readonly planeCorners: Float64Array;
  /** 1 where the rupture is a point (zone cell or point source), 0 where it is planar. */
  readonly isPoint: Uint8Array;
}

/** Lays out `ruptures` (as discretiseStudy gives them) in a RuptureTable. */
export function ruptureTable(ruptures: readonly Rupture[]): RuptureTable {
  const count = ruptures.length;
  const planeStart = new Int32Array(count + 1);
  let planes = 0;
  for (let i = 0; i < count; i++) {
    const r = ruptures[i] as Rupture;
    planeStart[i] = planes;
    if (r.surface.kind !== 'planes') continue;
    if (r.surface.planes.length === 0) throw new TremoraError(`a planar rupture surface needs at least one plane, got none (rupture ${i} of source "${r.sourceId}")`);
    planes += r.surface.planes.length;
  }
  planeStart[count] = planes;

  const table = {
    count,
    annualRate: new Float64Array(count),
    magnitude: new Float64Array(count),
    rakeDeg: new Float64Array(count),
    dipDeg: new Float64Array(count),
    ztorKm: new Float64Array(count),
    widthKm: new Float64Array(count),
    hypoDepthKm: new Float64Array(count),
    setting: new Uint8Array(count),
    mechanism: new Uint8Array(count),
    sourceIndex: new Int32Array(count),
    sourceIds: [] as string[],
    hypocentre: new Float64Array(count * 3),
    planeStart,
    planeCorners: new Float64Array(planes * PLANE_STRIDE),
    isPoint: new Uint8Array(count),
  };
  for (let i = 0; i < count; i++) {
    const r = ruptures[i] as Rupture;
    const c = r.context;
    table.annualRate[i] = r.annualRate;
    table.magnitude[i] = c.magnitude;
    table.rakeDeg[i] = c.rakeDeg;
    table.dipDeg[i] = c.dipDeg;
    table.ztorKm[i] = c.ztorKm;
    table.widthKm[i] = c.widthKm;
    table.hypoDepthKm[i] = c.hypoDepthKm;
    table.setting[i] = TECTONIC_SETTINGS.indexOf(c.setting);
    table.mechanism[i] = MECHANISMS.indexOf(c.mechanism);
    table.sourceIndex[i] = r.sourceIndex;
    table.sourceIds[r.sourceIndex] = r.sourceId;
    const h = r.surface.hypocentre;
    table.hypocentre[3 * i] = h.x;
    table.hypocentre[3 * i + 1] = h.y;
    table.hypocentre[3 * i + 2] = h.z;
    if (r.surface.kind !== 'planes') {
      table.isPoint[i] = 1;
      continue;
    }
    let at = (planeStart[i] as number) * PLANE_STRIDE;
    for (const plane of r.surface.planes) {
      for (const corner of plane.corners) {
        table.planeCorners[at++] = corner.x;
        table.planeCorners[at++] = corner.y;
        table.planeCorners[at++] = corner.z;
      }
    }
  }
  // Sources without ruptures leave holes; an empty id keeps the array dense for structured clone.
  table.sourceIds = Array.from(table.sourceIds, (id) => id ?? '');
  return table;
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

/** The rupture contexts of the listed ruptures, for the ground-motion models. */
export function ruptureContexts(table: RuptureTable, indices: Int32Array): RuptureContext[] {
  const contexts: RuptureContext[] = [];
  for (const i of indices) contexts.push(contextAt(table, i));
  return contexts;
}

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
