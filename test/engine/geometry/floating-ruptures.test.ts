import { describe, expect, it } from 'vitest';
import { faultSurface } from '../../../api/engine/geometry/fault-surface.ts';
import { floatingRuptures, positionOffsetsKm } from '../../../api/engine/geometry/floating-ruptures.ts';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { expectClose } from '../../helpers/close.ts';
import { FRAME, faultKm } from './km-fixtures.ts';

/* Position counts and offsets by hand from the rule in floating-ruptures.ts (common practice). */
describe('positionOffsetsKm', () => {
  it('a whole number of spacings: 100 km extent, 40 km rupture, 10 km spacing -> 0, 10, ..., 60', () => {
    const offsets = positionOffsetsKm(100, 40, 10);
    expect(offsets.length).toBe(7);
    offsets.forEach((o, k) => expectClose(o, 10 * k, 1e-12, `offset ${k}`));
  });
  it('not a whole number: 55 km of room at 10 km spacing -> 6 gaps of 9.1667 km, reaching both ends', () => {
    const offsets = positionOffsetsKm(100, 45, 10);
    expect(offsets.length).toBe(7);
    expectClose(offsets[6] ?? NaN, 55, 1e-12, 'last rupture ends at the far end');
    expectClose((offsets[1] ?? NaN) - (offsets[0] ?? NaN), 55 / 6, 1e-12, 'even spacing');
  });
  it('a rupture that fills the extent has one position', () => {
    expect(positionOffsetsKm(30, 30, 5)).toEqual([0]);
    expect(positionOffsetsKm(30, 31, 5)).toEqual([0]);
  });
});

describe('floatingRuptures', () => {
  const vertical = faultSurface(faultKm([[0, 0], [0, 100]], { dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 20 }), FRAME);

  it('a 40 x 10 km rupture on a 100 x 20 km fault at 5 km: 13 along x 3 down = 39 positions', () => {
    const ruptures = floatingRuptures(vertical, { areaKm2: 400, lengthKm: 40, widthKm: 10 }, { spacingKm: 5 });
    expect(ruptures.length).toBe(39);
    const last = ruptures[38];
    expectClose(last?.alongKm ?? NaN, 60, 1e-9, 'last along-strike start');
    expectClose(last?.ztorKm ?? NaN, 10, 1e-9, 'deepest row tops at 10 km');
    expectClose(last?.hypocentre.z ?? NaN, 15, 1e-9, 'hypocentre at the rupture centre');
    expectClose(last?.hypocentre.y ?? NaN, 80, 1e-6, 'hypocentre mid-length');
    const first = ruptures[0];
    expectClose(first?.ztorKm ?? NaN, 0, 1e-12, 'first row at the top');
  });

  it('follows the trace across a joint: two planes, top edges adding to the rupture length', () => {
    const bent = faultSurface(faultKm([[0, 0], [0, 50], [50, 50]], { dipDeg: 60, dipDirectionDeg: 135, upperDepthKm: 0, lowerDepthKm: 12 }), FRAME);
    const ruptures = floatingRuptures(bent, { areaKm2: 40 * bent.widthKm, lengthKm: 40, widthKm: bent.widthKm }, { spacingKm: 10 });
    expect(ruptures.length).toBe(7); // 60 km of room at 10 km: starts 0, 10, ..., 60
    const across = ruptures.find((r) => Math.abs(r.alongKm - 30) < 1e-9);
    expect(across?.planes.length).toBe(2);
    const total = (across?.planes ?? []).reduce((s, p) => s + Math.hypot(p.corners[1].x - p.corners[0].x, p.corners[1].y - p.corners[0].y), 0);
    expectClose(total, 40, 1e-6, 'top edges add to 40 km');
  });

  it('refuses a spacing that is not positive', () => {
    expect(() => floatingRuptures(vertical, { areaKm2: 400, lengthKm: 40, widthKm: 10 }, { spacingKm: 0 })).toThrow(InvalidInput);
  });
});
