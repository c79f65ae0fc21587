import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { nearestFaults } from '../../../api/engine/geometry/nearest-faults.ts';
import { expectClose } from '../../helpers/close.ts';
import { FRAME, faultKm } from './km-fixtures.ts';

const WGS84 = geodesic.Geodesic.WGS84;
/**
 * turf's bearing is spherical; the geodesic azimuth on the ellipsoid differs from it by up to
 * about the flattening, 1/298 rad ≈ 0.2° (common practice): 0.25° allowed.
 */
const BEARING_TOL_DEG = 0.25;

const azimuthTo = (from: readonly [number, number], to: readonly [number, number]): number => {
  const a = WGS84.Inverse(from[1], from[0], to[1], to[0]).azi1 as number;
  return ((a % 360) + 360) % 360;
};

describe('nearestFaults', () => {
  const site = FRAME.origin;
  // Trace 5 km west of the site, dipping 30° east under it (W cos δ = 20 km at 30°, 10 km deep).
  const dipping = faultKm(
    [
      [-5, -30],
      [-5, 30],
    ],
    { id: 'dipping', dipDeg: 30, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 10 },
  );
  const east = faultKm(
    [
      [10, -20],
      [10, 20],
    ],
    { id: 'east', dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 15 },
  );
  const north = faultKm(
    [
      [-30, 30],
      [30, 30],
    ],
    { id: 'north', dipDeg: 90, dipDirectionDeg: 180, upperDepthKm: 0, lowerDepthKm: 15 },
  );
  const southWest = faultKm(
    [
      [-40, -40],
      [-40, -5],
    ],
    { id: 'south-west', dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 15 },
  );

  it('sorts vertical surface faults by distance (Rrup = Rjb for them) and keeps `count`', () => {
    const found = nearestFaults([north, southWest, east], FRAME, site, 3);
    expect(found.map((f) => f.sourceId)).toEqual(['east', 'north', 'south-west']);
    expectClose(found[0]?.distanceKm ?? NaN, 10, 1e-6, 'east fault 10 km away (hand geometry)');
    expectClose(found[1]?.distanceKm ?? NaN, 30, 1e-6, 'north fault 30 km away');
    expectClose(
      found[2]?.distanceKm ?? NaN,
      Math.hypot(40, 5),
      1e-6,
      'south-west fault: its northern end',
    );
    expect(nearestFaults([north, southWest, east], FRAME, site, 2).length).toBe(2);
  });

  it('bearings to the closest point of the surface projection, against the Karney (2013) geodesic azimuth', () => {
    const found = nearestFaults([east, southWest], FRAME, site, 2);
    const toEast = FRAME.toLonLat({ x: 10, y: 0 });
    expectClose(
      found[0]?.bearingDeg ?? NaN,
      azimuthTo(site, toEast),
      BEARING_TOL_DEG,
      'bearing to (10, 0) km: due east',
    );
    const toCorner = FRAME.toLonLat({ x: -40, y: -5 });
    expectClose(
      found[1]?.bearingDeg ?? NaN,
      azimuthTo(site, toCorner),
      BEARING_TOL_DEG,
      'bearing to the fault end at (-40, -5) km',
    );
    expect(found[1]?.bearingDeg ?? NaN).toBeGreaterThanOrEqual(0);
    expect(found[1]?.bearingDeg ?? NaN).toBeLessThan(360);
  });

  it('a site above a dipping fault: distance 0 and the bearing to the nearest point of its trace', () => {
    const [found] = nearestFaults([dipping], FRAME, site, 1);
    expectClose(found?.distanceKm ?? NaN, 0, 1e-9, 'Rjb = 0 on the hanging wall above the plane');
    expectClose(
      found?.bearingDeg ?? NaN,
      azimuthTo(site, FRAME.toLonLat({ x: -5, y: 0 })),
      BEARING_TOL_DEG,
      'due west to the trace',
    );
  });

  it('above a dipping fault: its depth straight below and Rrup, by hand geometry', () => {
    // Trace 5 km west, dipping 30° east: straight below the site the plane is 5 tan 30° deep,
    // and the shortest distance to it is 5 sin 30° = 2.5 km (perpendicular to the plane).
    const [found] = nearestFaults([dipping], FRAME, site, 1);
    expectClose(
      found?.depthBelowKm ?? NaN,
      5 * Math.tan(Math.PI / 6),
      1e-6,
      'depth of the plane below the site: 5 tan 30°',
    );
    expectClose(found?.rrupKm ?? NaN, 5 * Math.sin(Math.PI / 6), 1e-6, 'Rrup = 5 sin 30°');
    const [beside] = nearestFaults([east], FRAME, site, 1);
    expect(beside?.depthBelowKm).toBeUndefined();
    expectClose(beside?.rrupKm ?? NaN, 10, 1e-6, 'a vertical surface fault 10 km east: Rrup = Rjb');
  });

  it('a deep interface below the place comes after a shallow fault 20 km away, which tells places apart', () => {
    // Top edge 25 km deep, 10 km west, dipping 15° east under the site: 25 + 10 tan 15° deep below it.
    const deep = faultKm(
      [
        [-10, -60],
        [-10, 60],
      ],
      { id: 'deep', dipDeg: 15, dipDirectionDeg: 90, upperDepthKm: 25, lowerDepthKm: 45 },
    );
    const shallow = faultKm(
      [
        [20, -20],
        [20, 20],
      ],
      { id: 'shallow', dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 15 },
    );
    const found = nearestFaults([deep, shallow], FRAME, site, 2);
    expect(found.map((f) => f.sourceId)).toEqual(['shallow', 'deep']);
    expectClose(found[1]?.distanceKm ?? NaN, 0, 1e-9, 'Rjb 0: the site stands above the interface');
    expectClose(
      found[1]?.depthBelowKm ?? NaN,
      25 + 10 * Math.tan((15 * Math.PI) / 180),
      1e-6,
      'depth below: 25 + 10 tan 15°',
    );
    // Rrup to a plane dipping δ = 15° whose top edge is 25 km deep, 10 km away horizontally: the
    // perpendicular foot lies 10 cos δ − 25 sin δ = 3.2 km down dip (inside the plane), so Rrup
    // is the distance along the plane's normal, 10 sin δ + 25 cos δ.
    const dip = (15 * Math.PI) / 180;
    expectClose(
      found[1]?.rrupKm ?? NaN,
      10 * Math.sin(dip) + 25 * Math.cos(dip),
      1e-6,
      'perpendicular distance to the plane',
    );
  });
});
