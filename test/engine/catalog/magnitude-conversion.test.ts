import { describe, expect, it } from 'vitest';
import type { CatalogEvent } from '../../../api/engine/catalog/event.ts';
import {
  convertibleScale,
  convertMagnitudes,
  MAGNITUDE_RELATIONS,
} from '../../../api/engine/catalog/magnitude-conversion.ts';
import { expectClose } from '../../helpers/close.ts';

const event = (id: string, magnitude: number, magnitudeType: string): CatalogEvent => ({
  id,
  timeMs: 0,
  lon: -140,
  lat: -47,
  depthKm: 10,
  magnitude,
  magnitudeType,
});

// Coefficients as the relations' sources state them (recalled, "from memory" in the source
// text); the checks are the published formulas worked by hand. 1e-12: rounding only.
const TOL = 1e-12;
const expectMw = (converted: CatalogEvent | undefined, expectedMw: number, source: string): void =>
  expectClose(converted?.magnitude as number, expectedMw, TOL, source);

describe('convertMagnitudes', () => {
  it('converts Ms by Scordilis (2006), each branch on its range', () => {
    const { events, converted } = convertMagnitudes(
      [event('a', 5.0, 'Ms'), event('b', 7.0, 'MS'), event('c', 6.1, 'Ms_20')],
      ['scordilis2006-ms'],
    );
    // Scordilis (2006): Mw = 0.67 Ms + 2.07 (Ms 3.0–6.1); Mw = 0.99 Ms + 0.08 (Ms 6.2–8.2) (from memory).
    expectMw(events[0], 0.67 * 5.0 + 2.07, 'Scordilis 2006, Ms 3.0–6.1 branch');
    expectMw(events[1], 0.99 * 7.0 + 0.08, 'Scordilis 2006, Ms 6.2–8.2 branch');
    expectMw(events[2], 0.67 * 6.1 + 2.07, 'Scordilis 2006, Ms 3.0–6.1 branch at its upper bound');
    expect(converted).toEqual({ 'scordilis2006-ms': 3 });
  });

  it('converts mb by Scordilis (2006) and ML by Grünthal et al. (2009), marking what was reported', () => {
    const { events } = convertMagnitudes(
      [event('a', 5.0, 'mb'), event('b', 4.0, 'ML')],
      ['scordilis2006-mb', 'grunthal2009-ml'],
    );
    // Scordilis (2006): Mw = 0.85 mb + 1.03 (from memory).
    expectMw(events[0], 0.85 * 5.0 + 1.03, 'Scordilis 2006 mb relation');
    // Grünthal et al. (2009): Mw = 0.53 + 0.646 ML + 0.0376 ML² (from memory).
    expectMw(events[1], 0.53 + 0.646 * 4 + 0.0376 * 16, 'Grünthal et al. 2009 ML relation');
    expect(
      events.map((e) => [e.magnitudeType, 'convertedFrom' in e ? e.convertedFrom : undefined]),
    ).toEqual([
      ['Mw', { magnitude: 5.0, magnitudeType: 'mb', relation: 'scordilis2006-mb' }],
      ['Mw', { magnitude: 4.0, magnitudeType: 'ML', relation: 'grunthal2009-ml' }],
    ]);
  });

  it('does not extrapolate: a magnitude outside the range keeps its type and is counted', () => {
    const { events, converted, outsideRange } = convertMagnitudes(
      [event('a', 3.4, 'mb'), event('b', 3.5, 'mb'), event('c', 6.2, 'mb'), event('d', 6.3, 'mb')],
      ['scordilis2006-mb'],
    );
    expect(events.map((e) => e.magnitudeType)).toEqual(['mb', 'Mw', 'Mw', 'mb']);
    expect(converted).toEqual({ 'scordilis2006-mb': 2 });
    expect(outsideRange).toEqual({ 'scordilis2006-mb': 2 });
  });

  it('leaves scales nobody chose, and moment magnitudes, as they are', () => {
    const input = [
      event('a', 4.0, 'ML'),
      event('b', 5.0, 'Mw'),
      event('c', 5.0, 'mB'),
      event('d', 3.0, 'Md'),
    ];
    const { events, converted } = convertMagnitudes(input, ['scordilis2006-mb']);
    expect(events).toEqual(input);
    expect(converted).toEqual({});
  });

  it('refuses an unknown relation, naming the known ones', () => {
    expect(() => convertMagnitudes([], ['made-up'])).toThrow(
      /unknown magnitude relation "made-up"; expected one of scordilis2006-ms, scordilis2006-mb, grunthal2009-ml/,
    );
  });

  it('knows the IASPEI spellings of each scale', () => {
    expect(
      ['ML', 'Ml', 'MLv', 'mb', 'Mb', 'mB', 'Ms', 'MS', 'Ms_20', 'Mw', 'Md'].map(convertibleScale),
    ).toEqual(['ML', 'ML', 'ML', 'mb', 'mb', undefined, 'Ms', 'Ms', 'Ms', undefined, undefined]);
  });

  it('cites every relation with its range', () => {
    for (const r of MAGNITUDE_RELATIONS) {
      expect(r.source).toMatch(/\(\d{4}\)/);
      expect(r.source).toContain('from memory');
      expect(r.min).toBeLessThan(r.max);
    }
  });
});
