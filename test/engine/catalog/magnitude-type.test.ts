import { describe, expect, it } from 'vitest';
import type { CatalogEvent } from '../../../api/engine/catalog/event.ts';
import {
  countMagnitudeTypes,
  isMomentMagnitudeType,
  selectByMagnitudeType,
} from '../../../api/engine/catalog/magnitude-type.ts';

describe('magnitude types', () => {
  it('recognise the moment-magnitude family', () => {
    // IASPEI magnitude names (common practice): Mw and its variants by method are moment
    // magnitudes; local (ML), body-wave (mb), surface-wave (Ms) and duration (Md) are not.
    for (const t of ['Mw', 'MW', 'mw', 'Mww', 'Mwc', 'Mwb', 'Mwr', 'Mwp', 'M_w'])
      expect(isMomentMagnitudeType(t)).toBe(true);
    for (const t of ['ML', 'mb', 'mB', 'Ms', 'MS_20', 'Md', 'M', 'unknown', ''])
      expect(isMomentMagnitudeType(t)).toBe(false);
  });

  const event = (id: string, magnitudeType: string): CatalogEvent => ({
    id,
    timeMs: 0,
    lon: 0,
    lat: 0,
    depthKm: 10,
    magnitude: 4,
    magnitudeType,
  });
  const events = [
    event('a', 'Mw'),
    event('b', 'ML'),
    event('c', 'mb'),
    event('d', 'Mww'),
    event('e', 'ML'),
  ];

  it('select moment magnitudes by default and all on request', () => {
    const moment = selectByMagnitudeType(events);
    expect(moment.events.map((e) => e.id)).toEqual(['a', 'd']);
    expect(moment.excludedNonMoment).toBe(3);
    const all = selectByMagnitudeType(events, 'all');
    expect(all.events).toHaveLength(5);
    expect(all.excludedNonMoment).toBe(0);
  });

  it('count events by type', () => {
    expect(countMagnitudeTypes(events)).toEqual({
      byType: { Mw: 1, ML: 2, mb: 1, Mww: 1 },
      nonMoment: 3,
    });
  });
});
