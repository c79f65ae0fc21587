/**
 * Writes data-demo/catalog.csv: a synthetic catalog for the invented demo coast, drawn with a
 * fixed seed from the demo study's own sources, then thinned to the recording history of an
 * imagined regional network: complete from M 5.0 since 1946, M 4.0 since 1970, M 3.0 since 2000.
 * Zones and the interface follow their Gutenberg–Richter lines, extended below their mMin as a
 * network records small events too (the zones' and the slab's to M 3, the interface's to M 4);
 * the slab's events lie 0–20 km below the interface's surface, the interface's within 3 km of it.
 * Each crustal fault's events fall within 3 km of its surface's map outline, at its own annual
 * rate above its mMin (the engine's magnitude bins over its area), extended along its b-value
 * down to M 5 only: one magnitude unit of the smaller earthquakes on and beside a fault, without
 * letting the extension outnumber the background. Invented data for the demo only; never a check
 * value. Run: npx tsx data-demo/make-catalog.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { buffer, convex, featureCollection, lineString, point } from '@turf/turf';
import type { CatalogEvent } from '../api/engine/catalog/event.ts';
import { syntheticCatalog } from '../api/engine/catalog/synthetic-catalog.ts';
import { depthUnderKm } from '../api/engine/geometry/depth-below.ts';
import { faultSurface, wholeSurface } from '../api/engine/geometry/fault-surface.ts';
import { frameForStudy } from '../api/engine/geometry/projection.ts';
import type { FaultSource, LonLat, Source, ZoneSource } from '../api/engine/model.ts';
import { modelCatalog } from '../api/engine/motion/registry.ts';
import { createRandom } from '../api/engine/random.ts';
import { treeMagnitudeBins } from '../api/engine/recurrence/tree-magnitude-bins.ts';
import { loadStudy } from '../api/study/load-study.ts';

const SEED = 20261201;
const START_MS = Date.UTC(1946, 0, 1);
const END_MS = Date.UTC(2026, 0, 1);
const COMPLETENESS: readonly [sinceYear: number, magnitude: number][] = [
  [2000, 3.0],
  [1970, 4.0],
  [1946, 5.0],
];
/** The smallest magnitude drawn on a crustal fault's own Gutenberg–Richter line. */
const FAULT_EVENTS_FROM_M = 5.0;
/** Half the width of the band around a fault's surface outline its events fall in, km. */
const FAULT_BAND_KM = 3;

const here = new URL('.', import.meta.url);

/** The ring within FAULT_BAND_KM of a fault surface's map outline (its trace, when vertical). */
function faultBand(fault: FaultSource, frame: ReturnType<typeof frameForStudy>): LonLat[][] {
  const whole = wholeSurface(faultSurface(fault, frame));
  const corners = whole.kind === 'planes' ? whole.planes.flatMap((p) => p.corners) : [];
  const hull = convex(featureCollection(corners.map((c) => point([...frame.toLonLat(c)]))));
  const shape = buffer(hull ?? lineString(fault.trace.map((p) => [...p])), FAULT_BAND_KM, {
    units: 'kilometers',
  });
  const ring = shape?.geometry.type === 'Polygon' ? shape.geometry.coordinates[0] : undefined;
  if (!ring) throw new Error(`no band around the demo fault ${fault.id}`);
  return [ring.map(([lon, lat]) => [lon as number, lat as number] as const)];
}

/** The catalog CSV text for the demo study's JSON text (pure: same input, same text). */
export function buildDemoCatalog(studyText: string): {
  csv: string;
  recorded: number;
  drawn: number;
} {
  const loaded = loadStudy(JSON.parse(studyText), { models: modelCatalog });
  if (!loaded.ok) throw new Error('the demo study does not load');
  const { study } = loaded;
  const frame = frameForStudy(study);
  const byId = (id: string): Source => {
    const s = study.sources.find((x) => x.id === id);
    if (!s) throw new Error(`demo source ${id} missing`);
    return s;
  };
  const gr = (s: Source) => {
    if (s.recurrence.type !== 'gutenberg-richter' && s.recurrence.type !== 'moment-balanced')
      throw new Error(`demo source ${s.id}: expected a Gutenberg–Richter or moment-balanced one`);
    return s.recurrence;
  };
  /** The annual rate of M >= mMin of a source: the engine's magnitude bins summed. */
  const rateAboveMin = (s: Source) => {
    const areaKm2 = s.kind === 'fault' ? faultSurface(s, frame).areaKm2 : undefined;
    return treeMagnitudeBins(s.recurrence, study.settings, areaKm2).annualRates.reduce(
      (a, r) => a + r,
      0,
    );
  };

  const random = createRandom(SEED);
  const events: CatalogEvent[] = [];
  /** Draws a source's events from `mMin` up, on its b-value line through its rate above its mMin. */
  const draw = (
    s: Source,
    rings: readonly (readonly LonLat[])[],
    depthKm: [number, number],
    mMin: number,
  ) => {
    const { bValue, mMin: sourceMin, mMax } = gr(s);
    return syntheticCatalog({
      random,
      bValue,
      mMin: mMin - 0.05,
      mMax,
      annualRate: rateAboveMin(s) * 10 ** (-bValue * (mMin - 0.05 - (sourceMin - 0.05))),
      rings,
      depthKm,
      startMs: START_MS,
      endMs: END_MS,
      magnitudeStep: 0.1,
      idPrefix: `${s.id}-`,
    });
  };

  const background = byId('orle-background') as ZoneSource;
  events.push(...draw(background, background.rings, [2, 15], 3.0));
  const iface = byId('orle-interface') as FaultSource;
  const slabTop = wholeSurface(faultSurface(iface, frame));
  const slabPlanes = slabTop.kind === 'planes' ? slabTop.planes : [];
  /** Events drawn at depths relative to the interface's surface, moved to lie below it. */
  const belowSlabTop = (drawn: CatalogEvent[]) =>
    drawn.map((e) => ({
      ...e,
      depthKm: Math.max(
        1,
        (depthUnderKm(slabPlanes, frame.toLocal([e.lon, e.lat])) ?? 0) + (e.depthKm ?? 0),
      ),
    }));
  const slab = byId('orle-slab') as ZoneSource;
  events.push(...belowSlabTop(draw(slab, slab.rings, [0, 20], 3.0)));
  // The interface's events fall over its surface projection: from the trench to its deepest contour.
  const contours = iface.contours?.lines ?? [iface.trace];
  const band: LonLat[] = [
    ...(contours[0] ?? []),
    ...[...(contours.at(-1) ?? [])].reverse(),
    contours[0]?.[0] as LonLat,
  ];
  events.push(...belowSlabTop(draw(iface, [band], [-3, 3], 4.0)));
  for (const id of ['vennick-fault', 'pellow-thrust', 'lisk-fault']) {
    const fault = byId(id) as FaultSource;
    events.push(
      ...draw(
        fault,
        faultBand(fault, frame),
        [fault.upperDepthKm, fault.lowerDepthKm],
        FAULT_EVENTS_FROM_M,
      ),
    );
  }

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
