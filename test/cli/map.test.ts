import { mkdtemp, readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCapturing as run } from './helpers/run-cli.ts';

// The tiny invented study (one point source under one village, Cornell79), mapped over a small box.
const TINY = new URL('fixtures/tiny.study.json', import.meta.url).pathname;
const BOX = '-140.2,-47.1,-139.8,-46.9';

/** The checks of RFC 7946 a map's file must pass, and the properties Tremora promises on each point. */
function expectMapGeoJson(doc: any, unit: string): void {
  expect(doc.type).toBe('FeatureCollection');
  expect(Array.isArray(doc.features)).toBe(true);
  expect(doc.features.length).toBe(doc.map.count);
  expect(doc.map.count).toBe(doc.map.columns * doc.map.rows);
  expect(doc.map.valueUnit).toBe(unit);
  for (const f of doc.features) {
    expect(f.type).toBe('Feature');
    expect(f.geometry.type).toBe('Point');
    expect(f.geometry.coordinates).toHaveLength(2);
    const [lon, lat] = f.geometry.coordinates;
    expect(lon >= -180 && lon <= 180 && lat >= -90 && lat <= 90).toBe(true);
    expect(f.properties.unit).toBe(unit);
    expect(f.properties.measure).toBe('PGA');
    expect(f.properties.value === null || Number.isFinite(f.properties.value)).toBe(true);
    expect(['ok', 'below-lowest-level', 'above-highest-level']).toContain(f.properties.status);
  }
  expect(Array.isArray(doc.warnings)).toBe(true);
}

describe('tremora map', () => {
  it('writes the 475-year PGA as GeoJSON points with value and unit, draws progress on stderr and sums up on stdout', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-map-'));
    const out = join(dir, 'map.geojson');
    const {
      code,
      out: stdout,
      err,
    } = await run(
      'map',
      TINY,
      '--measure',
      'PGA',
      '--return-period',
      '475',
      '--spacing',
      '4',
      `--bounds=${BOX}`,
      '--out',
      out,
      '--threads',
      '1',
    );
    expect(code).toBe(0);
    const doc = JSON.parse(await readFile(out, 'utf8'));
    expectMapGeoJson(doc, 'g');
    expect(doc.map.quantity).toEqual({ kind: 'return-period', returnPeriodYears: 475 });
    expect(err).toMatch(/map \[#+\] 100%/);
    expect(stdout).toContain(
      `points (${doc.map.columns} x ${doc.map.rows}) every 4 km, written to ${out}`,
    );
    expect(stdout).toContain('not design values');
    // The village sits on the source: the highest value is near it, and values fall away from it.
    const values = doc.features.map((f: any) => f.properties.value ?? 0);
    expect(Math.max(...values)).toBeGreaterThan(Math.min(...values));
  });

  it('with --json and no --out prints only the GeoJSON; with --level and --horizon maps chances (unit: probability)', async () => {
    const { code, out, err } = await run(
      'map',
      TINY,
      '--level',
      '0.2',
      '--horizon',
      '50',
      '--spacing',
      '8',
      `--bounds=${BOX}`,
      '--json',
      '--threads',
      '1',
    );
    expect(code).toBe(0);
    expect(err).toBe('');
    const doc = JSON.parse(out);
    expectMapGeoJson(doc, 'probability');
    for (const f of doc.features)
      expect(f.properties.value >= 0 && f.properties.value <= 1).toBe(true);
  });

  it('refuses a missing spacing, a return period with a level, and bad bounds (usage, exit 2)', async () => {
    expect((await run('map', TINY, '--return-period', '475')).code).toBe(2);
    const both = await run(
      'map',
      TINY,
      '--return-period',
      '475',
      '--level',
      '0.1',
      '--horizon',
      '50',
      '--spacing',
      '5',
    );
    expect(both.code).toBe(2);
    expect(both.err).toContain('not both');
    const bounds = await run(
      'map',
      TINY,
      '--return-period',
      '475',
      '--spacing',
      '5',
      '--bounds=1,2,3',
    );
    expect(bounds.err).toContain('--bounds: expected four numbers');
  });
});
