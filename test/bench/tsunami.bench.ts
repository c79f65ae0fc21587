/**
 * `npm run bench -- tsunami`: the time of the tsunami travel-time solve for the demo study over
 * its terrain grid (data-demo/demo-terrain.asc): reading the grid, resampling it to the local
 * frame, and fast marching from the interface's rupture area. Median of five runs after one
 * warm-up; prints figures, asserts nothing about time.
 */
import { fileURLToPath } from 'node:url';
import { frameForStudy } from '../../api/engine/geometry/projection.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import {
  fastMarching,
  interfaceSourceArea,
  longWaveGrid,
  solveGrids,
  startCells,
  tsunamiScreening,
} from '../../api/engine/tsunami/index.ts';
import { readStudyFile } from '../../api/study/read-study-file.ts';
import { readTerrainFile } from '../../api/terrain/index.ts';

const DEMO = fileURLToPath(new URL('../../data-demo/demo.study.json', import.meta.url));
const TERRAIN = fileURLToPath(new URL('../../data-demo/demo-terrain.asc', import.meta.url));
const RUNS = 5;

const median = (values: number[]) =>
  [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] as number;
function time(work: () => void): number {
  work();
  const ms: number[] = [];
  for (let i = 0; i < RUNS; i += 1) {
    const start = performance.now();
    work();
    ms.push(performance.now() - start);
  }
  return median(ms);
}

const loaded = await readStudyFile(DEMO, modelCatalog);
if (!loaded.ok) throw new Error(JSON.stringify(loaded.issues));
const study = loaded.study;
const readStart = performance.now();
const grid = await readTerrainFile(TERRAIN);
const readMs = performance.now() - readStart;
const frame = frameForStudy(study);
const source = study.sources.find((s) => s.setting === 'interface');
if (!source) throw new Error('the demo has no interface source');
const area = interfaceSourceArea(source, frame);
const grids = solveGrids(grid, frame);
const toLonLat = frame.toLonLat.bind(frame);
const slowness = longWaveGrid(grids.fine);
const start = startCells(grids.fine, area, grid.label, toLonLat);

const resampleMs = time(() => solveGrids(grid, frame));
const marchMs = time(() => fastMarching(slowness, start));
const wholeMs = time(() => tsunamiScreening(study, grid));

console.log(
  `terrain ${grid.label}: ${grid.columns} × ${grid.rows} cells, read in ${readMs.toFixed(0)} ms`,
);
console.log(
  `solve grid: ${grids.fine.columns} × ${grids.fine.rows} cells of ${grids.fine.spacingKm.toFixed(2)} km (and ${grids.coarse.columns} × ${grids.coarse.rows} of ${grids.coarse.spacingKm.toFixed(2)} km); ${start.length} start cells`,
);
console.log(`resampling both grids: ${resampleMs.toFixed(0)} ms (median of ${RUNS})`);
console.log(
  `fast marching, fine grid: ${marchMs.toFixed(0)} ms (median of ${RUNS}), ${((grids.fine.columns * grids.fine.rows) / (marchMs / 1000)).toExponential(2)} cells/s`,
);
console.log(
  `whole tsunami screening of the demo (both grids, one source, 6 coastal villages, high ground): ${wholeMs.toFixed(0)} ms (median of ${RUNS})`,
);
