import { describe, expect, it } from 'vitest';
import {
  epicentralDistanceKm,
  epicentralPath,
  MIN_KM_PER_DEGREE_LATITUDE,
} from '../../../api/engine/catalog/epicentral.ts';
import { expectClose } from '../../helpers/close.ts';

describe('epicentral distance and azimuth (WGS84 geodesics, Karney 2013)', () => {
  it('gives a degree of the equator as a π / 180', () => {
    // Along the equator the geodesic is the equator (for arcs under about 179°): the WGS84
    // semi-major axis a = 6378137 m (NIMA TR8350.2) times π/180 = 111.319491 km per degree.
    expectClose(epicentralDistanceKm(0, 0, 1, 0), 111.319491, 1e-6, 'WGS84 a · π / 180');
    expectClose(epicentralPath(0, 0, 1, 0).azimuthDeg, 90, 1e-9, 'due east along the equator');
  });

  it('gives the meridian degree at the equator', () => {
    // Meridian arc from the equator to 1°: the integral of the meridian radius of curvature
    // a (1 − e²) / (1 − e² sin²φ)^(3/2) with WGS84 a = 6378137 m, f = 1/298.257223563
    // (NIMA TR8350.2), by the midpoint rule with 1e5 steps (computed by hand, outside this code):
    // 110.574389 km.
    expectClose(
      epicentralDistanceKm(-150, 0, -150, 1),
      110.574389,
      1e-6,
      'integral of the WGS84 meridian radius of curvature, 0° to 1°',
    );
    expectClose(
      epicentralPath(-150, -47, -150, -46).azimuthDeg,
      0,
      1e-9,
      'due north along a meridian',
    );
    expectClose(
      epicentralPath(-150, -46, -150, -47).azimuthDeg,
      180,
      1e-9,
      'due south along a meridian',
    );
  });

  it('never comes closer than the latitude bound the declustering search uses', () => {
    // A degree of latitude is shortest at the equator (meridian radius of curvature a(1 − e²)
    // there); the bound 110.5 km must sit below the distance of any two points a degree apart in latitude.
    for (const lat of [-89, -60, -47, 0, 30, 88]) {
      expect(epicentralDistanceKm(-150, lat, -150, lat + 1) >= MIN_KM_PER_DEGREE_LATITUDE).toBe(
        true,
      );
      expect(epicentralDistanceKm(-150, lat, -149, lat + 1) >= MIN_KM_PER_DEGREE_LATITUDE).toBe(
        true,
      );
    }
  });

  it('is zero for the same epicentre', () => {
    expect(epicentralDistanceKm(-150, -47, -150, -47)).toBe(0);
  });
});
