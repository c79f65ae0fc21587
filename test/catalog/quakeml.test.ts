import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseQuakeMl } from '../../api/catalog/quakeml.ts';

const fixture = readFileSync(new URL('./fixtures/small-catalog.quakeml', import.meta.url), 'utf8');

describe('QuakeML 1.2', () => {
  const load = parseQuakeMl(fixture);

  it('parses the hand-written file, honouring the preferred origin and magnitude', () => {
    expect(load.format).toBe('quakeml');
    expect(load.events).toEqual([
      // Preferred origin 1b and magnitude 1b; depth 12500 m = 12.5 km; microseconds rounded to ms.
      {
        id: 'smi:local/event/1',
        timeMs: Date.UTC(2015, 2, 4, 5, 6, 7, 523),
        lon: -149.75,
        lat: -47.25,
        depthKm: 12.5,
        magnitude: 5.3,
        magnitudeType: 'Mww',
      },
      // No preference: the first origin and magnitude; a time without zone is UTC.
      {
        id: 'smi:local/event/2',
        timeMs: Date.UTC(2016, 6, 8, 9, 10, 11),
        lon: -150.4,
        lat: -46.8,
        depthKm: 8,
        magnitude: 3.7,
        magnitudeType: 'ML',
      },
      // No depth: loaded without one.
      {
        id: 'smi:local/event/5',
        timeMs: Date.UTC(2018, 1, 1),
        lon: -150.1,
        lat: -46.5,
        depthKm: null,
        magnitude: 4.4,
        magnitudeType: 'Mw',
      },
    ]);
  });

  it('reports bad events by position and publicID', () => {
    expect(load.rejected.map((r) => [r.index, r.id, r.where])).toEqual([
      [3, 'smi:local/event/3', 'event 3 (smi:local/event/3)'],
      [4, 'smi:local/event/4', 'event 4 (smi:local/event/4)'],
    ]);
    expect(load.rejected[0]?.reasons).toEqual([
      'preferredOriginID: "smi:local/origin/missing" matches no origin of this event',
    ]);
    expect(load.rejected[1]?.reasons).toEqual(['type: "quarry blast" is not an earthquake']);
    expect(load.summary).toEqual({
      loaded: 3,
      rejected: 2,
      byMagnitudeType: { Mww: 1, ML: 1, Mw: 1 },
      nonMoment: 1,
      withoutDepth: 1,
    });
  });

  it('keeps an event whose type is written "null" (no type given), as it keeps one without a type', () => {
    const nullType = parseQuakeMl(fixture.replace('<type>earthquake</type>', '<type>null</type>'));
    expect(nullType.events.map((e) => e.id)).toContain('smi:local/event/1');
    expect(nullType.rejected.map((r) => r.reasons.join(' '))).not.toContain(
      'type: "null" is not an earthquake',
    );
  });

  it('refuses text that is not well-formed XML, with the line', () => {
    expect(() => parseQuakeMl('<quakeml>\n<eventParameters>\n</quakeml>')).toThrow(
      /line 3: expected well-formed QuakeML XML/,
    );
    expect(() => parseQuakeMl('<other/>')).toThrow(/eventParameters/);
  });
});
