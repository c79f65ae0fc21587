import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeCatalogLoad } from '../../api/catalog/catalog-load.ts';
import { parseCatalogCsv } from '../../api/catalog/csv.ts';

const fixture = readFileSync(new URL('./fixtures/small-catalog.csv', import.meta.url), 'utf8');

describe('catalog CSV', () => {
  const load = parseCatalogCsv(fixture);

  it('loads the good rows with their fields', () => {
    expect(load.format).toBe('csv');
    expect(load.events.map((e) => e.id)).toEqual(['ev-1', 'ev-2', 'ev-3', 'ev-5', 'line-8']);
    expect(load.events[0]).toEqual({
      id: 'ev-1',
      timeMs: Date.UTC(2001, 1, 3, 4, 5, 6),
      lon: -150.1,
      lat: -47.2,
      depthKm: 12.5,
      magnitude: 4.6,
      magnitudeType: 'Mw',
    });
    expect(load.events[1]?.timeMs).toBe(Date.UTC(2001, 1, 3, 5, 0, 0, 250));
    // No zone: UTC. "+02:00": two hours ahead of UTC.
    expect(load.events[2]?.timeMs).toBe(Date.UTC(2002, 6, 1, 12, 0, 0));
    // An empty depth cell: loaded without a depth.
    expect(load.events[3]?.depthKm).toBeNull();
    expect(load.events[4]?.timeMs).toBe(Date.UTC(2005, 4, 5, 3, 5, 5));
  });

  it('reports each bad row with its line number and what was wrong', () => {
    expect(load.rejected.map((r) => r.line)).toEqual([5, 9, 10]);
    expect(load.rejected[0]?.reasons.join(' ')).toMatch(/time: expected a real calendar date/);
    expect(load.rejected[1]?.reasons.join(' ')).toMatch(/duplicate id "ev-1" \(first at line 2\)/);
    expect(load.rejected[2]?.reasons.join(' ')).toMatch(/expected 7 fields; got 6/);
    expect(load.rejected[0]?.id).toBe('ev-4');
  });

  it('summarises counts and flags magnitude types other than moment magnitude', () => {
    expect(load.summary).toEqual({
      loaded: 5,
      rejected: 3,
      byMagnitudeType: { Mw: 1, ML: 1, Mww: 1, mb: 2 },
      nonMoment: 3,
      withoutDepth: 1,
    });
    expect(load.notes).toContain('1 rows had no id and were given "line-<number>"');
    const text = describeCatalogLoad(load);
    expect(text).toMatch(/^Loaded 5 events; rejected 3\. Rejected: line 5: /);
    expect(text).toMatch(
      /3 events have magnitude types other than moment magnitude \(ML 1, mb 2\)/,
    );
    expect(text).toMatch(
      /1 event has no depth: counted in recurrence, left out of the felt history/,
    );
  });

  it('keeps lines right across Windows line ends and quoted fields', () => {
    const text =
      'time,lon,lat,depthKm,magnitude,magnitudeType,id\r\n"2001-01-01T00:00:00Z",-150,-47,10,4,Mw,"a\r\nb"\r\nbad,-150,-47,10,4,Mw,c\r\n';
    const r = parseCatalogCsv(text);
    expect(r.events.map((e) => e.id)).toEqual(['a\nb']);
    expect(r.rejected.map((x) => x.line)).toEqual([4]);
  });

  it('refuses a header without the required columns', () => {
    expect(() => parseCatalogCsv('time,lon,lat,magnitude\n2001-01-01,-150,-47,4\n')).toThrow(
      /missing depthKm, magnitudeType/,
    );
    expect(() => parseCatalogCsv('\n\n')).toThrow(/header row/);
  });

  it('rejects values outside their ranges, every problem at once', () => {
    const r = parseCatalogCsv(
      'time,lon,lat,depthKm,magnitude,magnitudeType\n2001-01-01T00:00:00Z,200,-47,900,abc,Mw\n',
    );
    expect(r.rejected[0]?.reasons).toEqual([
      'lon: expected a number from -180 to 180 degrees; got "200"',
      'depthKm: expected a number from -10 to 800 km; got "900"',
      'magnitude: expected a number from -3 to 10; got "abc"',
    ]);
  });
});
