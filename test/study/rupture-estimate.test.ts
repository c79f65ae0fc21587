import { describe, expect, it } from 'vitest';
import type { Recurrence } from '../../api/engine/model.ts';
import { discretiseSource } from '../../api/engine/ruptures/discretise.ts';
import { sourceRuptureEstimate } from '../../api/study/rupture-estimate.ts';
import { FRAME, SETTINGS, pointKm, zoneKm } from '../engine/geometry/km-fixtures.ts';
import { boxRing } from '../helpers/box-ring.ts';

const GR: Recurrence = { type: 'gutenberg-richter', bValue: 1, mMin: 4.5, mMax: 7.5, rate: 1 };

// The limit on ruptures must count the virtual ruptures of large point-source earthquakes
// (eight each) and of zone cells (one each, as many as points), estimated from above before any
// is built (ruptures/virtual-ruptures.ts).
describe('sourceRuptureEstimate counts virtual ruptures', () => {
  it('a point source: exactly its 20 point bins below M 6.5 and 10 bins of 8 virtual ruptures', () => {
    const point = pointKm(0, 0, GR, 10);
    const built = discretiseSource(point, 0, FRAME, SETTINGS).length;
    expect(built).toBe(20 + 10 * 8);
    expect(sourceRuptureEstimate(point, SETTINGS)).toBe(built);
  });

  it('a zone: one rupture per cell and bin as with points (6 x 4 cells x 30 bins), the estimate at least that and not above three times it', () => {
    const zone = zoneKm([boxRing(0, 0, 60, 40)], GR);
    const built = discretiseSource(zone, 0, FRAME, SETTINGS).length;
    expect(built).toBe(6 * 4 * 30);
    const estimate = sourceRuptureEstimate(zone, SETTINGS);
    expect(estimate).toBeGreaterThanOrEqual(built);
    expect(estimate).toBeLessThanOrEqual(3 * built);
  });
});
