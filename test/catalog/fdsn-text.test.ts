import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseFdsnText } from '../../api/catalog/fdsn-text.ts';

const fixture = readFileSync(new URL('./fixtures/small-catalog.txt', import.meta.url), 'utf8');

describe('FDSN event text', () => {
  const load = parseFdsnText(fixture);

  it('parses the hand-written file to the expected events', () => {
    expect(load.format).toBe('fdsn-text');
    expect(load.events).toEqual([
      {
        id: 'tr0001',
        timeMs: Date.UTC(2010, 0, 2, 3, 4, 5, 678),
        lon: -150.2,
        lat: -47.3,
        depthKm: 15,
        magnitude: 5.1,
        magnitudeType: 'Mw',
      },
      {
        id: 'tr0002',
        timeMs: Date.UTC(2010, 0, 5),
        lon: -150.21,
        lat: -47.31,
        depthKm: 9.5,
        magnitude: 3.4,
        magnitudeType: 'ML',
      },
      {
        id: 'tr0006',
        timeMs: Date.UTC(2012, 5, 1),
        lon: -149.6,
        lat: -46.9,
        depthKm: 60.2,
        magnitude: 6.0,
        magnitudeType: 'Mwc',
      },
      {
        id: 'tr0007',
        timeMs: Date.UTC(2012, 5, 2),
        lon: -149.61,
        lat: -46.91,
        depthKm: 12,
        magnitude: 4.2,
        magnitudeType: 'unknown',
      },
    ]);
  });

  it('reports bad lines with their numbers and reasons', () => {
    expect(load.rejected.map((r) => [r.line, r.id])).toEqual([
      [4, 'tr0003'],
      [5, 'tr0004'],
      [6, undefined],
    ]);
    expect(load.rejected[0]?.reasons.join(' ')).toMatch(/real calendar date/);
    expect(load.rejected[1]?.reasons.join(' ')).toMatch(
      /lat: expected a number from -90 to 90 degrees; got "-95.0"/,
    );
    expect(load.rejected[2]?.reasons.join(' ')).toMatch(
      /expected 13 fields separated by "\|"; got 4/,
    );
    expect(load.summary).toEqual({
      loaded: 4,
      rejected: 3,
      byMagnitudeType: { Mw: 1, ML: 1, Mwc: 1, unknown: 1 },
      nonMoment: 2,
      withoutDepth: 0,
    });
  });

  it('finds columns by name and honours an EventType column', () => {
    const text = [
      '#EventID | Time | Latitude | Longitude | Depth/km | MagType | Magnitude | EventType',
      'a|2020-01-01T00:00:00|-47|-150|10|Mw|4.5|earthquake',
      'b|2020-01-02T00:00:00|-47|-150|0|ML|2.0|quarry blast',
    ].join('\n');
    const r = parseFdsnText(text);
    expect(r.events.map((e) => e.id)).toEqual(['a']);
    expect(r.rejected[0]?.reasons).toEqual(['EventType: "quarry blast" is not an earthquake']);
  });

  it('refuses a file without the header or its required columns', () => {
    expect(() => parseFdsnText('a|b|c\n')).toThrow(/header line beginning with "#EventID/);
    expect(() => parseFdsnText('#EventID|Time|Latitude\n')).toThrow(
      /missing Longitude, Depth\/km, MagType, Magnitude/,
    );
  });
});
