import { dbfBytes, type DbfField, kmlText, zipBytes } from '../community-files/fixtures.ts';

/*
 * Small fault files made by the tests themselves, in the invented demo region (east of the demo
 * coast, on land that is not a real place). Two faults with the attribute names a regional
 * database might use: FAULT_NAME, SLIP_RATE, DIP, DIP_DIR, RAKE, LSD (lower seismogenic depth).
 */

export const TRACE_A: readonly (readonly [number, number])[] = [
  [-150.3, -47.5],
  [-150.1, -47.2],
];
export const TRACE_B: readonly (readonly [number, number])[] = [
  [-149.9, -47.6],
  [-149.8, -47.45],
  [-149.7, -47.3],
];

export const FIELDS: readonly DbfField[] = [
  { name: 'FAULT_NAME', type: 'C', width: 20 },
  { name: 'SLIP_RATE', type: 'N', width: 8 },
  { name: 'DIP', type: 'N', width: 6 },
  { name: 'DIP_DIR', type: 'N', width: 6 },
  { name: 'RAKE', type: 'N', width: 6 },
  { name: 'LSD', type: 'N', width: 6 },
];

/** The two faults' attributes, in FIELDS order. */
export const RECORDS: readonly (readonly (string | number)[])[] = [
  ['Kessin Ridge fault', 1.5, 60, 120, 90, 15],
  ['Marrow Flats fault', 0.4, 45, 300, -90, 12],
];

const attributes = (record: readonly (string | number)[]) =>
  Object.fromEntries(FIELDS.map((f, i) => [f.name, record[i] as string | number]));

/** The two faults as GeoJSON text; `overrides` replaces attributes of each feature. */
export function faultGeoJson(overrides: readonly Record<string, unknown>[] = []): string {
  return JSON.stringify({
    type: 'FeatureCollection',
    features: [TRACE_A, TRACE_B].map((trace, i) => ({
      type: 'Feature',
      geometry: { type: 'LineString', coordinates: trace },
      properties: { ...attributes(RECORDS[i] as (string | number)[]), ...overrides[i] },
    })),
  });
}

/** The two faults as KML placemarks (the name as the placemark's name, the rest as ExtendedData). */
export function faultKml(): string {
  return kmlText(
    [TRACE_A, TRACE_B].map((line, i) => {
      const [name, ...rest] = RECORDS[i] as (string | number)[];
      return {
        name: name as string,
        line,
        data: Object.fromEntries(FIELDS.slice(1).map((f, j) => [f.name, String(rest[j])])),
      };
    }),
  );
}

/**
 * A polyline shapefile's .shp (ESRI Shapefile Technical Description, 1998: shape type 3; each
 * record a big-endian number and length in 16-bit words, then little-endian shape type, bounding
 * box, part count, point count, part starts and the points), one part per record.
 */
export function lineShp(lines: readonly (readonly (readonly [number, number])[])[]): Uint8Array {
  const contentBytes = lines.map((l) => 4 + 32 + 4 + 4 + 4 + 16 * l.length);
  const total = 100 + contentBytes.reduce((n, b) => n + 8 + b, 0);
  const shp = new DataView(new ArrayBuffer(total));
  const all = lines.flat();
  const box = (ps: readonly (readonly [number, number])[]) => [
    Math.min(...ps.map((p) => p[0])),
    Math.min(...ps.map((p) => p[1])),
    Math.max(...ps.map((p) => p[0])),
    Math.max(...ps.map((p) => p[1])),
  ];
  shp.setInt32(0, 9994, false);
  shp.setInt32(24, total / 2, false);
  shp.setInt32(28, 1000, true);
  shp.setInt32(32, 3, true);
  box(all).forEach((v, i) => shp.setFloat64(36 + i * 8, v, true));
  let at = 100;
  lines.forEach((line, r) => {
    shp.setInt32(at, r + 1, false);
    shp.setInt32(at + 4, (contentBytes[r] as number) / 2, false);
    shp.setInt32(at + 8, 3, true);
    box(line).forEach((v, i) => shp.setFloat64(at + 12 + i * 8, v, true));
    shp.setInt32(at + 44, 1, true);
    shp.setInt32(at + 48, line.length, true);
    shp.setInt32(at + 52, 0, true);
    line.forEach(([x, y], i) => {
      shp.setFloat64(at + 56 + i * 16, x, true);
      shp.setFloat64(at + 64 + i * 16, y, true);
    });
    at += 8 + (contentBytes[r] as number);
  });
  return new Uint8Array(shp.buffer);
}

/** The two faults as a zipped shapefile in longitude and latitude (no .prj). */
export function faultShapefileZip(): Uint8Array {
  return zipBytes({
    'faults.shp': lineShp([TRACE_A, TRACE_B]),
    'faults.dbf': dbfBytes(FIELDS, RECORDS),
  });
}
