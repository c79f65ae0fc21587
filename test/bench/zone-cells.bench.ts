import { createLocalFrame } from '../../api/engine/geometry/projection.ts';
import { zoneCells } from '../../api/engine/geometry/zone-cells.ts';
import type { ZoneSource } from '../../api/engine/model.ts';
import { everyBoxCell } from '../helpers/zone-cells-by-box.ts';
import { loadLine, machineLine } from './hazard-cases.ts';

/**
 * Cutting a thin diagonal zone (2 km wide) into 1 km cells: zoneCells, which visits the cells
 * along the zone, against every cell of the bounding box clipped in turn (test/helpers). The
 * strip runs from 100 to 400 km across the diagonal of its box. Prints figures; asserts nothing
 * about time.
 *
 *   npm run bench -- zone-cells
 */
const FRAME = createLocalFrame([-150, -47]);
const seconds = (ms: number): string => `${(ms / 1000).toFixed(2)} s`;

function strip(sideKm: number): ZoneSource {
  const ring = [
    [0, 0],
    [2, 0],
    [sideKm, sideKm - 2],
    [sideKm, sideKm],
    [sideKm - 2, sideKm],
    [0, 2],
    [0, 0],
  ].map(([x, y]) => FRAME.toLonLat({ x: x as number, y: y as number }));
  return {
    kind: 'zone',
    id: `strip-${sideKm}`,
    name: 'Thin diagonal strip',
    setting: 'crustal',
    mechanism: 'strike-slip',
    rakeDeg: 0,
    recurrence: { type: 'fixed', magnitude: 6, rate: 0.01 },
    rings: [ring],
    depthKm: 10,
  };
}

console.log(`Tremora zone-cells benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(`machine: ${machineLine()}`);
console.log(`${loadLine()} at the start (other work on the machine slows every figure)`);

for (const sideKm of [100, 200, 400]) {
  const zone = strip(sideKm);
  let start = performance.now();
  const cells = zoneCells(zone, FRAME, 1);
  const alongMs = performance.now() - start;
  start = performance.now();
  const plain = everyBoxCell(zone, FRAME, 1);
  const boxMs = performance.now() - start;
  console.log(
    `strip across ${sideKm} km: ${cells.length} cells (${plain.length} the plain way) of ${sideKm * sideKm} in the box; ` +
      `along the zone ${seconds(alongMs)}, every box cell ${seconds(boxMs)}`,
  );
}
