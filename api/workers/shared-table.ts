import type { RuptureTable } from '../engine/hazard/rupture-table.ts';

type Column = Float64Array | Int32Array | Uint8Array;

function shared<T extends Column>(column: T): T {
  const Kind = column.constructor as { new (buffer: SharedArrayBuffer): T };
  const copy = new Kind(new SharedArrayBuffer(column.byteLength));
  copy.set(column);
  return copy;
}

/**
 * The table with every column on shared memory: posting it to a worker thread then passes the
 * memory itself, where a plain typed array would be copied (several MB for a study like the
 * demo's) for every chunk of work. Nothing writes to a table once built, so sharing is safe.
 */
export function shareTable(table: RuptureTable): RuptureTable {
  return {
    count: table.count,
    annualRate: shared(table.annualRate),
    magnitude: shared(table.magnitude),
    rakeDeg: shared(table.rakeDeg),
    dipDeg: shared(table.dipDeg),
    ztorKm: shared(table.ztorKm),
    widthKm: shared(table.widthKm),
    hypoDepthKm: shared(table.hypoDepthKm),
    setting: shared(table.setting),
    mechanism: shared(table.mechanism),
    sourceIndex: shared(table.sourceIndex),
    sourceIds: [...table.sourceIds],
    hypocentre: shared(table.hypocentre),
    planeStart: shared(table.planeStart),
    traceEnd: shared(table.traceEnd),
    planeCorners: shared(table.planeCorners),
    isPoint: shared(table.isPoint),
    cellRule: shared(table.cellRule),
    cellCentre: shared(table.cellCentre),
    cellRadiusKm: shared(table.cellRadiusKm),
  };
}
