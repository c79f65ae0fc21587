import { describe, expect, it } from 'vitest';
import type { Recurrence } from '../../api/engine/model.ts';
import { discretiseSource } from '../../api/engine/ruptures/discretise.ts';
import { sourceRuptureEstimate } from '../../api/study/rupture-estimate.ts';
import { FRAME, SETTINGS, pointKm, zoneKm } from '../engine/geometry/km-fixtures.ts';

const GR: Recurrence = { type: 'gutenberg-richter', bValue: 1, mMin: 4.5, mMax: 7.5, rate: 1 };

// The limit on ruptures must count the virtual ruptures of large zone and point earthquakes
// (ruptures/virtual-ruptures.ts), estimated from above before any is built.
describe('sourceRuptureEstimate counts virtual ruptures', () => {
  it('a point source: exactly its 15 point bins and 15 bins of 8 virtual ruptures', () => {
    const point = pointKm(0, 0, GR, 10);
    const built = discretiseSource(point, 0, FRAME, SETTINGS).length;
    expect(built).toBe(15 + 15 * 8);
    expect(sourceRuptureEstimate(point, SETTINGS)).toBe(built);
  });

  it('a zone: at least the ruptures built, and not above three times them', () => {
    const zone = zoneKm(
      [
        [
          [0, 0],
          [60, 0],
          [60, 40],
          [0, 40],
          [0, 0],
        ],
      ],
      GR,
    );
    const built = discretiseSource(zone, 0, FRAME, SETTINGS).length;
    const estimate = sourceRuptureEstimate(zone, SETTINGS);
    expect(estimate).toBeGreaterThanOrEqual(built);
    expect(estimate).toBeLessThanOrEqual(3 * built);
  });
});
