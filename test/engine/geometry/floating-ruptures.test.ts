import { describe, expect, it } from 'vitest';
import { faultSurface } from '../../../api/engine/geometry/fault-surface.ts';
import {
  endToEndOffsetsKm,
  floatingRuptures,
  positionOffsetsKm,
} from '../../../api/engine/geometry/floating-ruptures.ts';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { expectClose } from '../../helpers/close.ts';
import { FRAME, faultKm, bentFaultSurface } from './km-fixtures.ts';

/* Position counts and offsets by hand from the midpoint rule (Press et al. 2007, Numerical Recipes 3rd ed., section 4.1). */
describe('positionOffsetsKm', () => {
  it('a whole number of spacings: 60 km of room at 10 km -> the middles 5, 15, ..., 55', () => {
    const offsets = positionOffsetsKm(100, 40, 10);
    expect(offsets.length).toBe(6);
    offsets.forEach((o, k) => expectClose(o, 5 + 10 * k, 1e-12, `offset ${k}`));
  });
  it('not a whole number: 55 km of room at 10 km -> 6 intervals of 9.1667 km, one position in the middle of each', () => {
    const offsets = positionOffsetsKm(100, 45, 10);
    expect(offsets.length).toBe(6);
    expectClose(
      offsets[0] ?? NaN,
      55 / 12,
      1e-12,
      'first position half an interval from the start',
    );
    expectClose(
      offsets[5] ?? NaN,
      55 - 55 / 12,
      1e-12,
      'last position half an interval from the end',
    );
    expectClose((offsets[1] ?? NaN) - (offsets[0] ?? NaN), 55 / 6, 1e-12, 'even spacing');
  });
  it('the mean start is the middle of the room, as for a uniform start', () => {
    const offsets = positionOffsetsKm(73, 21.5, 5);
    expectClose(
      offsets.reduce((s, o) => s + o, 0) / offsets.length,
      (73 - 21.5) / 2,
      1e-12,
      'mean of a uniform start on [0, 51.5]',
    );
  });
  it('a rupture that fills the extent has one position', () => {
    expect(positionOffsetsKm(30, 30, 5)).toEqual([0]);
    expect(positionOffsetsKm(30, 31, 5)).toEqual([0]);
  });
});

describe('endToEndOffsetsKm (a scenario searching for the nearest placement)', () => {
  it('55 km of room at 10 km -> 6 gaps of 9.1667 km, reaching both ends', () => {
    const offsets = endToEndOffsetsKm(100, 45, 10);
    expect(offsets.length).toBe(7);
    expectClose(offsets[0] ?? NaN, 0, 1e-12, 'first rupture starts at the start');
    expectClose(offsets[6] ?? NaN, 55, 1e-12, 'last rupture ends at the far end');
  });
});

describe('floatingRuptures', () => {
  const vertical = faultSurface(
    faultKm(
      [
        [0, 0],
        [0, 100],
      ],
      { dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 20 },
    ),
    FRAME,
  );

  it('a 40 x 10 km rupture on a 100 x 20 km fault at 5 km: 12 along x 2 down = 24 positions', () => {
    const ruptures = floatingRuptures(
      vertical,
      { areaKm2: 400, lengthKm: 40, widthKm: 10 },
      { spacingKm: 5 },
    );
    expect(ruptures.length).toBe(24);
    const last = ruptures[23];
    expectClose(
      last?.alongKm ?? NaN,
      57.5,
      1e-9,
      'last along-strike start, mid-way through the last 5 km interval',
    );
    expectClose(last?.ztorKm ?? NaN, 7.5, 1e-9, 'deepest row tops at 7.5 km');
    expectClose(last?.hypocentre.z ?? NaN, 12.5, 1e-9, 'hypocentre at the rupture centre');
    expectClose(last?.hypocentre.y ?? NaN, 77.5, 1e-6, 'hypocentre mid-length');
    const first = ruptures[0];
    expectClose(first?.ztorKm ?? NaN, 2.5, 1e-12, 'first row tops at 2.5 km');
  });

  it('follows the trace across a joint: two planes, top edges adding to the rupture length', () => {
    const bent = bentFaultSurface(50, 60);
    const ruptures = floatingRuptures(
      bent,
      { areaKm2: 40 * bent.widthKm, lengthKm: 40, widthKm: bent.widthKm },
      { spacingKm: 10 },
    );
    expect(ruptures.length).toBe(6); // 60 km of room at 10 km: starts 5, 15, ..., 55
    const across = ruptures.find((r) => Math.abs(r.alongKm - 35) < 1e-9);
    expect(across?.planes.length).toBe(2);
    const total = (across?.planes ?? []).reduce(
      (s, p) => s + Math.hypot(p.corners[1].x - p.corners[0].x, p.corners[1].y - p.corners[0].y),
      0,
    );
    expectClose(total, 40, 1e-6, 'top edges add to 40 km');
  });

  it('refuses a spacing that is not positive', () => {
    expect(() =>
      floatingRuptures(vertical, { areaKm2: 400, lengthKm: 40, widthKm: 10 }, { spacingKm: 0 }),
    ).toThrow(InvalidInput);
  });
});
