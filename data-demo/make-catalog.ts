/**
 * Writes data-demo/catalog.csv: a synthetic catalog for the invented demo coast, drawn with a
 * fixed seed from the demo study's own Gutenberg–Richter zones (extended below each zone's
 * mMin, as a network records small events too), then thinned to the recording history of an
 * imagined regional network: complete from M 5.0 since 1946, M 4.0 since 1970, M 3.0 since 2000.
 * Invented data for the demo only; never a check value. Run: npx tsx data-demo/make-catalog.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { CatalogEvent } from '../api/engine/catalog/event.ts';
import { syntheticCatalog } from '../api/engine/catalog/synthetic-catalog.ts';
import type { LonLat } from '../api/engine/model.ts';
import { createRandom } from '../api/engine/random.ts';

const SEED = 20261201;
const START_MS = Date.UTC(1946, 0, 1);
const END_MS = Date.UTC(2026, 0, 1);
const COMPLETENESS: readonly [sinceYear: number, magnitude: number][] = [
  [2000, 3.0],
  [1970, 4.0],
  [1946, 5.0],
];

interface DemoFeature {
  geometry: { type: string; coordinates: unknown };
  properties: {
    id: string;
    depthKm?: number;
    lowerDepthKm?: number;
    upperDepthKm?: number;
    recurrence: { bValue: number; mMin: number; mMax: number; rate: number };
  };
}

const here = new URL('.', import.meta.url);

/** The catalog CSV text for the demo study's JSON text (pure: same input, same text). */
export function buildDemoCatalog(studyText: string): {
  csv: string;
  recorded: number;
  drawn: number;
} {
  const study = JSON.parse(studyText) as { sources: { features: DemoFeature[] } };
  const byId = (id: string) => {
    const f = study.sources.features.find((x) => x.properties.id === id);
    if (!f) throw new Error(`demo source ${id} missing`);
    return f;
  };
  /** The rate of M >= m of a zone's Gutenberg–Richter line, extended below its mMin. */
  const rateAbove = (f: DemoFeature, m: number) =>
    f.properties.recurrence.rate *
    10 ** (-f.properties.recurrence.bValue * (m - f.properties.recurrence.mMin));

  const random = createRandom(SEED);
  const events: CatalogEvent[] = [];
  const draw = (
    id: string,
    rings: readonly (readonly LonLat[])[],
    depthKm: [number, number],
    mMin: number,
  ) => {
    const f = byId(id);
    events.push(
      ...syntheticCatalog({
        random,
        bValue: f.properties.recurrence.bValue,
        mMin: mMin - 0.05,
        mMax: f.properties.recurrence.mMax,
        annualRate: rateAbove(f, mMin - 0.05),
        rings,
        depthKm,
        startMs: START_MS,
        endMs: END_MS,
        magnitudeStep: 0.1,
        idPrefix: `${id}-`,
      }),
    );
  };

  draw('orle-background', byId('orle-background').geometry.coordinates as LonLat[][], [2, 15], 3.0);
  draw('orle-slab', byId('orle-slab').geometry.coordinates as LonLat[][], [55, 80], 3.0);
  // The interface's events fall over its surface projection: a band east of the trench.
  const trench = byId('orle-interface').geometry.coordinates as LonLat[];
  const band: LonLat[] = [
    ...trench,
    ...[...trench].reverse().map(([lon, lat]) => [lon + 1.9, lat] as const),
    trench[0] as LonLat,
  ];
  draw('orle-interface', [band], [8, 40], 4.0);

  const yearOf = (ms: number) => new Date(ms).getUTCFullYear();
  const recorded = events
    .filter((e) =>
      COMPLETENESS.some(([since, m]) => yearOf(e.timeMs) >= since && e.magnitude >= m - 1e-9),
    )
    .sort((a, b) => a.timeMs - b.timeMs || a.id.localeCompare(b.id));

  const lines = ['time,lon,lat,depthKm,magnitude,magnitudeType,id'];
  for (const e of recorded) {
    lines.push(
      [
        new Date(e.timeMs).toISOString(),
        e.lon.toFixed(3),
        e.lat.toFixed(3),
        e.depthKm?.toFixed(1) ?? '',
        e.magnitude.toFixed(1),
        e.magnitudeType,
        e.id,
      ].join(','),
    );
  }
  return { csv: `${lines.join('\n')}\n`, recorded: recorded.length, drawn: events.length };
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { csv, recorded, drawn } = buildDemoCatalog(
    readFileSync(new URL('demo.study.json', here), 'utf8'),
  );
  writeFileSync(new URL('catalog.csv', here), csv);
  console.log(`data-demo/catalog.csv: ${recorded} events (of ${drawn} drawn), seed ${SEED}`);
}
