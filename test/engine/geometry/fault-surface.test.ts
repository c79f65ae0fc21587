import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import {
  faultSurface,
  pointOnSurface,
  surfacePatch,
  wholeSurface,
} from '../../../api/engine/geometry/fault-surface.ts';
import { expectClose } from '../../helpers/close.ts';
import { FRAME, faultKm } from './km-fixtures.ts';

/** A straight 100 km trace along the local y axis, south to north (km). */
const NORTH_SOUTH_TRACE: [number, number][] = [
  [0, -50],
  [0, 50],
];
/** A fault on NORTH_SOUTH_TRACE: dip, dip direction (degrees), upper and lower depth (km). */
const northSouthFault = (
  dipDeg: number,
  dipDirectionDeg: number,
  upperDepthKm: number,
  lowerDepthKm: number,
) => faultKm(NORTH_SOUTH_TRACE, { dipDeg, dipDirectionDeg, upperDepthKm, lowerDepthKm });
const TOL_KM = 1e-6; // projection round trip is good to about 1e-9 km

describe('faultSurface', () => {
  it('builds a dipping plane from a straight trace (geometry by hand: width = depth range / sin dip)', () => {
    const fault = northSouthFault(30, 90, 0, 10);
    const s = faultSurface(fault, FRAME);
    expect(s.reversed).toBe(false);
    expectClose(s.lengthKm, 100, TOL_KM, 'trace length by hand');
    expectClose(s.widthKm, 20, 1e-9, '10 km / sin 30° = 20 km');
    expectClose(s.areaKm2, 2000, 1e-4, '100 km x 20 km');
    const whole = wholeSurface(s);
    if (whole.kind !== 'planes') throw new Error('expected a planar surface');
    expect(whole.planes.length).toBe(1);
    const bottomEnd = whole.planes[0]?.corners[2];
    expectClose(
      bottomEnd?.x ?? NaN,
      20 * Math.cos(Math.PI / 6),
      TOL_KM,
      'bottom edge W cos 30° east of the trace',
    );
    expectClose(bottomEnd?.y ?? NaN, 50, TOL_KM, 'bottom edge end below the trace end');
    expectClose(bottomEnd?.z ?? NaN, 10, 1e-9, 'bottom edge at the lower depth');
  });

  it('walks the trace backwards when the fault dips to its left, keeping the dip on the right', () => {
    const fault = northSouthFault(45, 270, 2, 12);
    const s = faultSurface(fault, FRAME);
    expect(s.reversed).toBe(true);
    const first = s.segments[0];
    expectClose(first?.start.y ?? NaN, 50, TOL_KM, 'trace now starts at its northern end');
    const bottom = pointOnSurface(s, 0, s.widthKm);
    expectClose(bottom.x, -10, TOL_KM, 'dips west: 10 km depth range at 45° lies 10 km west');
    expectClose(bottom.z, 12, 1e-9, 'lower depth');
  });

  it('gives each segment of a bent trace its own strike, dipping perpendicular to it', () => {
    // Trace north 40 km, then north-east 40 km; dipping east-ish (to the right).
    const d = 40 / Math.SQRT2;
    const fault = faultKm(
      [
        [0, 0],
        [0, 40],
        [d, 40 + d],
      ],
      { dipDeg: 60, dipDirectionDeg: 100, upperDepthKm: 0, lowerDepthKm: 15 },
    );
    const s = faultSurface(fault, FRAME);
    expect(s.segments.length).toBe(2);
    expectClose(s.lengthKm, 80, TOL_KM, 'two 40 km segments');
    const second = s.segments[1];
    expectClose(
      second?.downDip.x ?? NaN,
      Math.SQRT1_2,
      1e-9,
      'second segment dips south-east (perpendicular to its NE strike)',
    );
    expectClose(second?.downDip.y ?? NaN, -Math.SQRT1_2, 1e-9, 'second segment dips south-east');
    const planes = surfacePatch(s, [0, s.lengthKm], [0, s.widthKm]);
    expect(planes.length).toBe(2);
  });

  it('refuses a dip direction along the trace, a dip outside (0, 90] and depths out of order', () => {
    const along = northSouthFault(45, 0, 0, 10);
    expect(() => faultSurface(along, FRAME)).toThrow(/dip direction/);
    const flat = northSouthFault(0, 90, 0, 10);
    expect(() => faultSurface(flat, FRAME)).toThrow(InvalidInput);
    const upside = northSouthFault(45, 90, 10, 5);
    expect(() => faultSurface(upside, FRAME)).toThrow(/lowerDepthKm/);
  });
});
