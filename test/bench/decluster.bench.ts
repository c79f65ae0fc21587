import { declusterGardnerKnopoff } from '../../api/engine/catalog/gardner-knopoff.ts';
import { syntheticCatalog } from '../../api/engine/catalog/synthetic-catalog.ts';
import { createRandom } from '../../api/engine/random.ts';
import { declusterGardnerKnopoffByScan } from '../helpers/gardner-knopoff-oracle.ts';
import { loadLine, machineLine } from './hazard-cases.ts';

/**
 * Gardner & Knopoff (1974) declustering of seeded synthetic catalogs (Gutenberg–Richter b = 1
 * from M 3, epicentres uniform in a 10° × 10° open-ocean box, 30 years): the indexed method at
 * 10,000 to 1,000,000 events, and the plain scan of every event in each time window
 * (test/helpers, the oracle of the tests) up to 100,000, with the process's peak resident memory
 * so far (it only grows, so read each line's figure as "by then").
 * Prints figures; asserts nothing about time.
 *
 *   npm run bench -- decluster
 */
const BOX: [number, number][][] = [
  [
    [-150, -50],
    [-140, -50],
    [-140, -40],
    [-150, -40],
    [-150, -50],
  ],
];
const seconds = (ms: number): string => `${(ms / 1000).toFixed(2)} s`;

console.log(`Tremora declustering benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(`machine: ${machineLine()}`);
console.log(`${loadLine()} at the start (other work on the machine slows every figure)`);

for (const count of [10_000, 100_000, 1_000_000]) {
  const events = syntheticCatalog({
    random: createRandom(count),
    bValue: 1,
    mMin: 3,
    mMax: 8,
    eventCount: count,
    rings: BOX,
    depthKm: [0, 30],
    startMs: Date.UTC(1990, 0, 1),
    endMs: Date.UTC(2020, 0, 1),
    magnitudeStep: 0.1,
  });
  const runs: [string, typeof declusterGardnerKnopoff][] = [['indexed', declusterGardnerKnopoff]];
  if (count <= 100_000) runs.push(['plain scan', declusterGardnerKnopoffByScan]);
  for (const [name, decluster] of runs) {
    const started = performance.now();
    const result = decluster(events);
    const ms = performance.now() - started;
    const peakRssMb = Math.round(process.resourceUsage().maxRSS / 1024);
    console.log(
      `${count.toLocaleString('en')} events, ${name}: ${seconds(ms)}; ${result.mainshocks.length.toLocaleString('en')} mainshocks, ` +
        `${result.removed.length.toLocaleString('en')} removed; peak RSS so far ${peakRssMb} MB`,
    );
  }
}
