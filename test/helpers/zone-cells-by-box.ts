import type { LocalFrame } from '../../api/engine/geometry/projection.ts';
import { subdivideZoneCell, type ZoneCell } from '../../api/engine/geometry/zone-cells.ts';
import type { ZoneSource } from '../../api/engine/model.ts';

/**
 * The plain way to cut a zone: every cell of its bounding box on zoneCells' grid, clipped in
 * turn (as subdivideZoneCell does for one square holding the whole zone). The tests check
 * zoneCells, which visits only the cells along the zone, against it; the benchmark times both.
 */
/** Every cell of the zone's bounding box on zoneCells' grid, clipped one by one. */
export function everyBoxCell(zone: ZoneSource, frame: LocalFrame, cellKm: number): ZoneCell[] {
  const outer = (zone.rings[0] ?? []).map((p) => frame.toLocal(p));
  const { x: ax, y: ay } = outer[0] as { x: number; y: number };
  const col0 = Math.floor((Math.min(...outer.map((v) => v.x)) - ax) / cellKm);
  const col1 = Math.ceil((Math.max(...outer.map((v) => v.x)) - ax) / cellKm);
  const row0 = Math.floor((Math.min(...outer.map((v) => v.y)) - ay) / cellKm);
  const row1 = Math.ceil((Math.max(...outer.map((v) => v.y)) - ay) / cellKm);
  const side = Math.max(col1 - col0, row1 - row0);
  const whole: ZoneCell = {
    centre: { x: 0, y: 0 },
    areaKm2: 0,
    share: 1,
    box: [
      ax + col0 * cellKm,
      ay + row0 * cellKm,
      ax + (col0 + side) * cellKm,
      ay + (row0 + side) * cellKm,
    ],
    // The squares' lattice is then counted from the box's corner, not the zone's anchor.
    lattice: { column: 0, row: 0 },
  };
  return subdivideZoneCell(zone, frame, whole, side);
}
