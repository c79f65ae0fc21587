import { describe, expect, it } from 'vitest';
import { sourcePoints, studyPoints } from '../../../api/engine/geometry/study-points.ts';
import type { LonLat } from '../../../api/engine/model.ts';
import { FIXED_M7, faultLonLat, pointKm, zoneLonLat } from './km-fixtures.ts';

const TRACE: LonLat[] = [
  [-150.1, -47.1],
  [-150.2, -47.2],
];
const CONTOURS: LonLat[][] = [
  [
    [-150.1, -47.1],
    [-150.2, -47.2],
  ],
  [
    [-150.0, -47.15],
    [-150.1, -47.25],
  ],
];
const RING: LonLat[] = [
  [-149.9, -47.0],
  [-149.8, -47.0],
  [-149.8, -46.9],
  [-149.9, -47.0],
];
const FAULT_OPTIONS = { dipDeg: 30, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 20 };

describe('the points a study covers', () => {
  const fault = faultLonLat(TRACE, FAULT_OPTIONS);
  const contoured = {
    ...fault,
    contours: { lines: CONTOURS, depthsKm: [0, 20], meshSpacingKm: 5 },
  };
  const zone = zoneLonLat([RING], FIXED_M7);
  const point = pointKm(0, 0, FIXED_M7);

  it("takes a fault's trace, or its contours when it has them, a zone's rings and a point's place", () => {
    expect(sourcePoints([fault, zone, point])).toEqual([...TRACE, ...RING, point.location]);
    expect(sourcePoints([contoured])).toEqual(CONTOURS.flat());
  });

  it('puts the communities first and the outline last', () => {
    const community = {
      id: 'cove',
      name: 'Cove',
      lon: -150.3,
      lat: -47.3,
      vs30: 400,
      vs30Basis: 'measured' as const,
      coastal: false,
    };
    const outline = [RING];
    expect(studyPoints({ communities: [community], sources: [point], outline })).toEqual([
      [-150.3, -47.3],
      point.location,
      ...RING,
    ]);
    expect(studyPoints({ communities: [], sources: [] })).toEqual([]);
  });
});
