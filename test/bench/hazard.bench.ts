import { availableParallelism } from 'node:os';
import { ruptureDistances } from '../../api/engine/geometry/distances.ts';
import { frameForStudy } from '../../api/engine/geometry/projection.ts';
import { levelAtReturnPeriod } from '../../api/engine/hazard/curve-interpolation.ts';
import { levelsFor } from '../../api/engine/hazard/hazard-levels.ts';
import { mapGrid, gridPoint } from '../../api/engine/map/map-grid.ts';
import { MAP_VS30 } from '../../api/engine/map/hazard-map.ts';
import type { Study } from '../../api/engine/model.ts';
import { parseMeasure } from '../../api/engine/motion/measure.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { discretiseStudy } from '../../api/engine/ruptures/discretise.ts';
import { planScreening, resolveBranches, screeningSetup } from '../../api/engine/screening-plan.ts';
import { createFastHazard, fastSiteHazard } from '../../api/engine/hazard/fast-site-hazard.ts';
import { readStudyFile } from '../../api/study/read-study-file.ts';
import { referenceScreening } from '../helpers/reference-hazard/reference-screening.ts';
import { siteHazard } from '../helpers/reference-hazard/site-hazard.ts';
import {
  screenStudyOnPool,
  screeningOutput,
  type ScreeningText,
} from '../../api/workers/parallel-screen.ts';
import { WorkerPool } from '../../api/workers/worker-pool.ts';
import {
  largestDifference,
  latticeCommunities,
  loadLine,
  machineLine,
  mapRun,
  screeningDifference,
  syntheticStudy,
  withPeakRss,
} from './hazard-cases.ts';

/**
 * The hazard benchmark: the demo study; 100 communities with the demo's
 * sources; a 10,000-point map of the demo at 475-year PGA; 200 point sources × 1,000 sites × 25
 * levels with one crustal model; and the peak memory of a 10,000- and a 100,000-point map. For
 * each: wall time, ruptures × sites per second, exceedance terms per second, peak resident
 * memory and worker threads, and the largest difference between the engine and the plain
 * reference sum of test/helpers/reference-hazard/ (run in one thread). Prints figures; asserts nothing about time.
 *
 * "Exceedance terms" are the terms of the hazard sum: (rupture, site) pairs within the
 * distance cut-off × the branches that evaluate them × the levels of each measure.
 *
 *   npm run bench -- hazard            every case
 *   TREMORA_BENCH_FULL_MAP=1           run the 100,000-point map to the end (about ten times the
 *                                      10,000-point map's time); by default it is stopped after
 *                                      20,000 points, past the point where its memory levels off
 *   TREMORA_BENCH_CASES=demo,synthetic  only these of the cases demo, hundred (the 100
 *                                      communities), synthetic and maps (both maps)
 */
const THREADS = availableParallelism();
const CASES = new Set(
  (process.env.TREMORA_BENCH_CASES ?? 'demo,hundred,synthetic,maps')
    .split(',')
    .map((c) => c.trim()),
);
const STOP_100K = process.env.TREMORA_BENCH_FULL_MAP ? Infinity : 20_000;
const seconds = (ms: number): string => `${(ms / 1000).toFixed(2)} s`;
const rate = (n: number, ms: number): string => `${(n / (ms / 1000)).toExponential(2)}/s`;

console.log(`Tremora hazard benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(`machine: ${machineLine()}`);
console.log(`${loadLine()} at the start (other work on the machine slows every figure)`);

const loaded = await readStudyFile(
  new URL('../../data-demo/demo.study.json', import.meta.url).pathname,
  modelCatalog,
);
if (!loaded.ok) throw new Error('the demo study does not validate');
const demo = loaded.study;

/** Exceedance terms of a study's screening at its communities: pairs within the cut-off × branches × levels. */
function exceedanceTerms(
  study: Study,
  sites: readonly { x: number; y: number }[],
): { terms: number; ruptures: number } {
  const { ruptures } = discretiseStudy(study);
  const setup = screeningSetup(study, modelCatalog);
  const levels = setup.measures.all.reduce((n, m) => n + m.levels.length, 0);
  let terms = 0;
  for (const site of sites) {
    for (const r of ruptures) {
      if (ruptureDistances(r.surface, site).rjbKm <= study.settings.maxDistanceKm)
        terms += (setup.branches[r.context.setting]?.length ?? 0) * levels;
    }
  }
  return { terms, ruptures: ruptures.length };
}

/** Timed runs of each screening case after its first. */
const RUNS = 3;

const pool = new WorkerPool({ size: THREADS, name: 'bench', log: () => {} });
const warm = performance.now();
// One community per task, a few per thread, so that every thread (not only the first free one)
// has loaded its code and run the engine once before anything is timed, as in a service that has
// screened before.
await screenStudyOnPool(
  pool,
  { ...demo, communities: latticeCommunities(demo, 4 * THREADS, 'Warm-up village') },
  { chunkSize: 1 },
).result;
console.log(
  `\nthreads: ${THREADS} worker threads (one per core; the main thread only hands out work); started and warmed in ${seconds(performance.now() - warm)}`,
);

async function screeningCase(label: string, study: Study, referenceNote: string): Promise<void> {
  const frame = frameForStudy(study);
  const { terms, ruptures } = exceedanceTerms(
    study,
    study.communities.map((c) => frame.toLocal([c.lon, c.lat])),
  );
  // The first run, then RUNS more: a service screens many studies, so the figures are the
  // median run's (the first is printed beside it: it still pays for code the warm-up left cold).
  const runs: { wallMs: number; cpuMs: number; peakRssMb: number; text: ScreeningText }[] = [];
  for (let i = 0; i <= RUNS; i++) {
    const cpu = process.cpuUsage();
    const start = performance.now();
    const { value: text, peakRssMb } = await withPeakRss(
      () => screenStudyOnPool(pool, study).result,
    );
    const wallMs = performance.now() - start;
    const used = process.cpuUsage(cpu);
    runs.push({ wallMs, cpuMs: (used.user + used.system) / 1000, peakRssMb, text });
  }
  const first = runs[0]!;
  const median = [...runs.slice(1)].sort((a, b) => a.wallMs - b.wallMs)[RUNS >> 1]!;
  const { wallMs, text } = median;
  const peakRssMb = Math.max(...runs.map((r) => r.peakRssMb));
  const fast = screeningOutput(text);
  const refStart = performance.now();
  const reference = referenceScreening(study);
  const refMs = performance.now() - refStart;
  const sites = study.communities.length;
  console.log(
    `\n${label}: ${ruptures} ruptures × ${sites} sites, ${study.settings.measures.length} measures`,
  );
  console.log(
    `  wall time          ${seconds(wallMs)} (CPU ${seconds(median.cpuMs)}, all threads), the median of ${RUNS} runs after the first, which took ${seconds(first.wallMs)}`,
  );
  console.log(`  ruptures × sites   ${rate(ruptures * sites, wallMs)}`);
  console.log(`  exceedance terms   ${rate(terms, wallMs)} (${terms.toExponential(2)} terms)`);
  console.log(`  peak RSS           ${peakRssMb.toFixed(0)} MB`);
  console.log(`  worker threads     ${THREADS}`);
  console.log(
    `  fast vs reference  largest relative difference ${screeningDifference(fast, reference).toExponential(2)} (${referenceNote}; reference path ${seconds(refMs)} in this thread)`,
  );
}

if (CASES.has('demo'))
  await screeningCase(
    'demo study (all villages, all measures)',
    demo,
    'every rate of every curve and branch, every return-period level',
  );
if (CASES.has('hundred'))
  await screeningCase(
    '100 communities × the demo sources',
    { ...demo, communities: latticeCommunities(demo, 100, 'Bench village') },
    'every rate, every level',
  );

// The synthetic case: its reference runs on every site (200 ruptures each is quick).
const synthetic = syntheticStudy();
if (CASES.has('synthetic'))
  await screeningCase(
    'synthetic: 200 point sources × 1,000 sites × 25 levels, BSSA14',
    synthetic,
    'every site',
  );
if (CASES.has('synthetic')) {
  // The sum alone, without the screening's per-community results (intensity, deaggregation, result objects): the
  // 25-level curves of the 1,000 sites on the fast path, in this thread, after one warm-up pass.
  const plan = planScreening(synthetic, { models: modelCatalog });
  const fast = createFastHazard({
    table: plan.table!,
    branches: plan.branches,
    measures: plan.measures.all,
    truncationSigma: 3,
    maxDistanceKm: 300,
    branchCurves: false,
  });
  const frame = plan.frame;
  const sites = synthetic.communities.map((c) => ({
    point: frame.toLocal([c.lon, c.lat]),
    site: { vs30: c.vs30, vs30Measured: true },
  }));
  for (const site of sites) fastSiteHazard(fast, site);
  const passes: number[] = [];
  for (let pass = 0; pass < RUNS; pass++) {
    const start = performance.now();
    for (const site of sites) fastSiteHazard(fast, site);
    passes.push(performance.now() - start);
  }
  const ms = passes.sort((a, b) => a - b)[RUNS >> 1]!;
  const { terms } = exceedanceTerms(
    synthetic,
    sites.map((s) => s.point),
  );
  console.log(
    `  the sum alone      ${rate(terms, ms)} in one thread (${seconds(ms)} for the curves of the 1,000 sites, the median of ${RUNS} passes after a warm-up, no results assembly; twice that on two threads at best)`,
  );
}

/** The reference path at sampled points of the demo map: site-hazard.ts over every rupture, in the map's own frame. */
function referenceAtPoints(spacingKm: number, indices: readonly number[]): (number | null)[] {
  const frame = frameForStudy(demo);
  const grid = mapGrid(demo, frame, { spacingKm, maxPoints: Infinity });
  const { ruptures } = discretiseStudy(demo);
  const measure = {
    key: 'PGA',
    measure: parseMeasure('PGA'),
    levels: levelsFor(demo.settings.levels, 'PGA', parseMeasure('PGA')),
  };
  const branches = resolveBranches(demo, { all: [measure] }, modelCatalog, []);
  return indices.map((index) => {
    const site = gridPoint(grid, index);
    const hazard = siteHazard({
      ruptures,
      distances: ruptures.map((r) => ruptureDistances(r.surface, site)),
      site: { vs30: MAP_VS30, vs30Measured: false },
      branches,
      measures: [measure],
      truncationSigma: demo.settings.truncationSigma,
      maxDistanceKm: demo.settings.maxDistanceKm,
    });
    const curve = hazard.curves.PGA!;
    return levelAtReturnPeriod(curve.levels, curve.annualRate, 475).level;
  });
}

const SAMPLE_EVERY = 500;
if (CASES.has('maps')) {
  const map10k = mapRun(10_000, SAMPLE_EVERY);
  const sampled: { index: number; value: number | null }[] = map10k.samples;
  const refStart = performance.now();
  const referenceValues = referenceAtPoints(
    map10k.spacingKm,
    sampled.map((s) => s.index),
  );
  const refMs = performance.now() - refStart;
  const demoRuptures = discretiseStudy(demo).ruptures.length;
  const mapTerms = (() => {
    // Pairs within the cut-off, from the sampled points, scaled to the grid (the map evaluates one level per pass; this counts the 25 levels of the curve it reads).
    const frame = frameForStudy(demo);
    const grid = mapGrid(demo, frame, { spacingKm: map10k.spacingKm, maxPoints: Infinity });
    const sample = exceedanceTerms(
      { ...demo, settings: { ...demo.settings, measures: ['PGA'] } },
      sampled.map((s) => gridPoint(grid, s.index)),
    );
    return (sample.terms / sampled.length) * map10k.points;
  })();
  console.log(
    `\ngrid map of the demo region, 475-year PGA at Vs30 760: ${map10k.points} points every ${map10k.spacingKm.toFixed(3)} km × ${demoRuptures} ruptures`,
  );
  console.log(
    `  wall time          ${seconds(map10k.wallMs)} (CPU ${seconds(map10k.cpuMs)}, all threads)`,
  );
  console.log(`  ruptures × sites   ${rate(demoRuptures * map10k.points, map10k.wallMs)}`);
  console.log(
    `  exceedance terms   ${rate(mapTerms, map10k.wallMs)} (${mapTerms.toExponential(2)} terms of the 25-level curves, counted on the sampled points and scaled)`,
  );
  console.log(`  peak RSS           ${map10k.peakRssMb.toFixed(0)} MB`);
  console.log(`  worker threads     ${map10k.threads}`);
  console.log(
    `  fast vs reference  largest relative difference ${largestDifference(
      sampled.map((s) => s.value),
      referenceValues,
      1e-9,
    ).toExponential(
      2,
    )} (475-year PGA at every ${SAMPLE_EVERY}th point: ${sampled.length} points; reference path ${seconds(refMs)})`,
  );

  const map100k = mapRun(100_000, 0, STOP_100K);
  console.log(
    `\nmemory as the map grows (each map in a process of its own, GeoJSON streamed to a file):`,
  );
  console.log(`  ${map10k.points}-point map   peak RSS ${map10k.peakRssMb.toFixed(0)} MB`);
  console.log(
    `  ${map100k.points}-point map  peak RSS ${map100k.peakRssMb.toFixed(0)} MB${map100k.finished ? '' : ` (stopped after ${map100k.computed} points; TREMORA_BENCH_FULL_MAP=1 runs it to the end)`}, wall time ${seconds(map100k.wallMs)}`,
  );
  console.log(`  ratio              ${(map100k.peakRssMb / map10k.peakRssMb).toFixed(2)}`);
}
console.log(`\n${loadLine()} at the end`);
await pool.close();
