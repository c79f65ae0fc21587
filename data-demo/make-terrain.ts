/**
 * Writes data-demo/demo-terrain.asc (and its .prj): an invented elevation grid of the demo
 * coast, metres above sea level, negative below. Built from the demo study itself so it agrees
 * with it: land inside the study's outline, with a narrow inlet of sea reaching each coastal
 * village (the outline is coarser than a harbour); a coastal plain rising inland, hills behind
 * the villages and a river valley from Cawdry Vale down to Orlemouth; at sea a shelf, a slope, an
 * abyssal plain and a trench along the interface's trace. Every number here is invented, for the
 * demo only, and never a check value. Run: npx tsx data-demo/make-terrain.ts
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { createLocalFrame, type PointXY } from '../api/engine/geometry/projection.ts';

/** The grid: WGS84 lon/lat, cells of 0.02°, wide enough for the whole interface source. */
const WEST = -153.0,
  EAST = -148.4,
  SOUTH = -49.4,
  NORTH = -45.2,
  CELL = 0.02;

interface DemoStudy {
  communities: { id: string; lon: number; lat: number; coastal: boolean }[];
  sources: {
    features: {
      geometry: { type: string; coordinates: number[][] | number[][][] };
      properties: { id: string; setting: string };
    }[];
  };
  outline: { coordinates: number[][][] };
}

const here = new URL('.', import.meta.url);

/** The grid's values, northernmost row first (pure: same study, same grid). */
export function buildDemoTerrain(study: DemoStudy): {
  columns: number;
  rows: number;
  values: Int16Array;
} {
  const frame = createLocalFrame([-150.15, -47.35]);
  const ring = (study.outline.coordinates[0] as number[][]).map(([lon, lat]) =>
    frame.toLocal([lon as number, lat as number]),
  );
  // The trench follows the interface's trace, or its shallowest depth contour.
  const geometry = study.sources.features.find(
    (f) => f.properties.setting === 'interface',
  )?.geometry;
  const trace =
    (geometry?.type === 'MultiLineString'
      ? (geometry.coordinates as number[][][])[0]
      : (geometry?.coordinates as number[][] | undefined)) ?? [];
  const trench = trace.map(([lon, lat]) => frame.toLocal([lon as number, lat as number]));
  const at = (lon: number, lat: number) => frame.toLocal([lon, lat]);

  // An inlet from each coastal village to the nearest point of the outline, 1.5 km either side:
  // wide enough to stay open water when the tsunami solve resamples the grid (1.6 km cells).
  const inlets = study.communities
    .filter((c) => c.coastal)
    .map((c) => {
      const village = at(c.lon, c.lat);
      const shore = nearestOnPolyline(ring, village).point;
      const len = Math.hypot(shore.x - village.x, shore.y - village.y);
      const start = {
        x: village.x + ((shore.x - village.x) * 1.0) / Math.max(len, 1.0),
        y: village.y + ((shore.y - village.y) * 1.0) / Math.max(len, 1.0),
      };
      return [
        start,
        {
          x: shore.x + (shore.x - village.x) * (2 / Math.max(len, 0.1)),
          y: shore.y + (shore.y - village.y) * (2 / Math.max(len, 0.1)),
        },
      ] as const;
    });
  const hills = [
    { p: at(-149.7, -47.3), heightM: 260, sigmaKm: 9 },
    { p: at(-150.2, -47.3), heightM: 380, sigmaKm: 10 },
    { p: at(-149.9, -46.95), heightM: 200, sigmaKm: 7 },
    { p: at(-150.95, -47.2), heightM: 120, sigmaKm: 4 },
    { p: at(-150.75, -47.6), heightM: 110, sigmaKm: 4 },
    { p: at(-149.45, -47.4), heightM: 150, sigmaKm: 5 },
  ];
  const valley = [at(-150.6, -47.1), at(-150.95, -46.95)] as const;

  const columns = Math.round((EAST - WEST) / CELL);
  const rows = Math.round((NORTH - SOUTH) / CELL);
  const values = new Int16Array(columns * rows);
  for (let r = 0; r < rows; r += 1) {
    for (let c = 0; c < columns; c += 1) {
      const p = at(WEST + (c + 0.5) * CELL, NORTH - (r + 0.5) * CELL);
      const outlineKm = nearestOnPolyline(ring, p).km;
      const inletKm = Math.min(...inlets.map(([a, b]) => segmentDistance(a, b, p))) - 1.5;
      let z: number;
      if (insidePolygon(ring, p) && inletKm > 0) {
        const shoreKm = Math.min(outlineKm, inletKm);
        const valleyFactor =
          1 - 0.85 * Math.exp(-(segmentDistance(valley[0], valley[1], p) ** 2) / (2 * 3 ** 2));
        const plain = 60 * (1 - Math.exp(-shoreKm / 2)) + 4 * shoreKm;
        const hill = hills.reduce(
          (sum, h) =>
            sum +
            h.heightM * Math.exp(-((p.x - h.p.x) ** 2 + (p.y - h.p.y) ** 2) / (2 * h.sigmaKm ** 2)),
          0,
        );
        z = Math.max(1, (plain + hill * (1 - Math.exp(-shoreKm / 3))) * valleyFactor);
      } else if (inletKm <= 0 && insidePolygon(ring, p)) {
        z = -(6 + 3 * Math.min(outlineKm, 10));
      } else {
        // Shelf to 25 km out (to 200 m), slope to 60 km (3500 m), abyssal plain 4200 m; the trench 6500 m.
        const shelf =
          outlineKm <= 25
            ? 10 + 7.6 * outlineKm
            : outlineKm <= 60
              ? 200 + ((outlineKm - 25) / 35) * 3300
              : 3500 + Math.min(700, (outlineKm - 60) * 20);
        const trenchKm = trench.length > 1 ? nearestOnPolyline(trench, p).km : Infinity;
        z = -Math.max(shelf, 6500 * Math.exp(-(trenchKm ** 2) / (2 * 18 ** 2)));
      }
      values[r * columns + c] = Math.round(z);
    }
  }
  return { columns, rows, values };
}

function segmentDistance(a: PointXY, b: PointXY, p: PointXY): number {
  const dx = b.x - a.x,
    dy = b.y - a.y;
  const t = Math.max(
    0,
    Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy || 1)),
  );
  return Math.hypot(a.x + t * dx - p.x, a.y + t * dy - p.y);
}

function nearestOnPolyline(line: readonly PointXY[], p: PointXY): { km: number; point: PointXY } {
  let best = { km: Infinity, point: p };
  for (let i = 1; i < line.length; i += 1) {
    const a = line[i - 1] as PointXY,
      b = line[i] as PointXY;
    const dx = b.x - a.x,
      dy = b.y - a.y;
    const t = Math.max(
      0,
      Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / (dx * dx + dy * dy || 1)),
    );
    const q = { x: a.x + t * dx, y: a.y + t * dy };
    const km = Math.hypot(q.x - p.x, q.y - p.y);
    if (km < best.km) best = { km, point: q };
  }
  return best;
}

function insidePolygon(ring: readonly PointXY[], p: PointXY): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i] as PointXY,
      b = ring[j] as PointXY;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x)
      inside = !inside;
  }
  return inside;
}

/** The WKT of WGS84 longitude/latitude, for the .prj beside the grid. */
const WGS84_WKT =
  'GEOGCS["WGS 84",DATUM["WGS_1984",SPHEROID["WGS 84",6378137,298.257223563]],PRIMEM["Greenwich",0],UNIT["degree",0.0174532925199433]]';

if (import.meta.url === `file://${process.argv[1]}`) {
  const study = JSON.parse(readFileSync(new URL('demo.study.json', here), 'utf8')) as DemoStudy;
  const { columns, rows, values } = buildDemoTerrain(study);
  const lines = [
    `ncols ${columns}`,
    `nrows ${rows}`,
    `xllcorner ${WEST}`,
    `yllcorner ${SOUTH}`,
    `cellsize ${CELL}`,
    'NODATA_value -32768',
  ];
  for (let r = 0; r < rows; r += 1)
    lines.push(Array.from(values.subarray(r * columns, (r + 1) * columns)).join(' '));
  writeFileSync(new URL('demo-terrain.asc', here), `${lines.join('\n')}\n`);
  writeFileSync(new URL('demo-terrain.prj', here), `${WGS84_WKT}\n`);
  console.log(`demo-terrain.asc: ${columns} × ${rows} cells of ${CELL}°`);
}
