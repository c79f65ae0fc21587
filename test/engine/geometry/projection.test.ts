import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { createLocalFrame, frameForStudy } from '../../../api/engine/geometry/projection.ts';
import { InvalidInput } from '../../../api/engine/errors.ts';
import type { Community, Study } from '../../../api/engine/model.ts';
import { expectClose } from '../../helpers/close.ts';
import { pointKm, FIXED_M7 } from './km-fixtures.ts';

const WGS84 = geodesic.Geodesic.WGS84;
const LATITUDES = [0, -30, -47, -60];
const AZIMUTHS = [0, 30, 60, 90, 135, 180, 225, 270, 315];
const DISTANCES_KM = [1, 10, 50, 100, 200, 400];
/** Mean Earth radius, km (IUGG R1, from memory); only sizes the distortion bound below. */
const EARTH_RADIUS_KM = 6371.0088;

describe('local frame (ellipsoidal azimuthal equidistant)', () => {
  it('keeps geodesic distance and azimuth from its origin, 1–400 km, at four latitudes', () => {
    for (const lat of LATITUDES) {
      const frame = createLocalFrame([-150, lat]);
      for (const azi of AZIMUTHS) {
        for (const km of DISTANCES_KM) {
          const to = WGS84.Direct(lat, -150, azi, km * 1000);
          const p = frame.toLocal([to.lon2 as number, to.lat2 as number]);
          // Radial distance is exact in this projection; proj4 computes it by Vincenty's (1975)
          // inverse, good to about 0.1 mm (from memory): 1e-6 km is ten times that.
          expectClose(
            Math.hypot(p.x, p.y),
            km,
            1e-6,
            `Karney 2013 geodesic (geographiclib) lat ${lat} az ${azi} ${km} km`,
          );
          const aziDeg = (Math.atan2(p.x, p.y) * 180) / Math.PI;
          const dAz = ((aziDeg - azi + 540) % 360) - 180;
          expectClose(
            dAz,
            0,
            1e-6,
            `Karney 2013 azimuth at the origin, lat ${lat} az ${azi} ${km} km`,
          );
        }
      }
    }
  });

  it("gives separations between two points within the projection's distortion bound", () => {
    // In this projection no scale is below 1 and none above c / sin c at angular distance c from
    // the origin (Snyder 1987, from memory), so a straight-line separation can only exceed the
    // geodesic, by at most that factor at the farther point.
    for (const lat of LATITUDES) {
      const frame = createLocalFrame([-150, lat]);
      const a = WGS84.Direct(lat, -150, 40, 150e3);
      for (const azi of AZIMUTHS) {
        for (const km of [1, 10, 100, 400]) {
          const b = WGS84.Direct(a.lat2 as number, a.lon2 as number, azi, km * 1000);
          const pa = frame.toLocal([a.lon2 as number, a.lat2 as number]);
          const pb = frame.toLocal([b.lon2 as number, b.lat2 as number]);
          const c = Math.max(Math.hypot(pa.x, pa.y), Math.hypot(pb.x, pb.y)) / EARTH_RADIUS_KM;
          const bound = c / Math.sin(c) - 1;
          const rel = Math.hypot(pa.x - pb.x, pa.y - pb.y) / km - 1;
          expect(
            rel,
            `lat ${lat} az ${azi} ${km} km: relative excess ${rel} vs bound ${bound}`,
          ).toBeGreaterThanOrEqual(-1e-8);
          expect(
            rel,
            `lat ${lat} az ${azi} ${km} km: relative excess ${rel} vs bound ${bound}`,
          ).toBeLessThanOrEqual(bound + 1e-6);
        }
      }
    }
  });

  it('round-trips positions and km', () => {
    for (const lat of LATITUDES) {
      const frame = createLocalFrame([-150, lat]);
      for (const [x, y] of [
        [0, 0],
        [1, -1],
        [-250, 130],
        [399, 0],
        [0, -399],
        [123.456, 321.09],
      ] as const) {
        const ll = frame.toLonLat({ x, y });
        const back = frame.toLocal(ll);
        expectClose(back.x, x, 1e-6, 'round trip x (km)');
        expectClose(back.y, y, 1e-6, 'round trip y (km)');
        const again = frame.toLonLat(back);
        expectClose(again[0], ll[0], 1e-9, 'round trip lon (deg)');
        expectClose(again[1], ll[1], 1e-9, 'round trip lat (deg)');
      }
    }
  });

  it('maps its origin to (0, 0) and works across the 180° meridian', () => {
    const frame = createLocalFrame([179.5, -30]);
    const o = frame.toLocal([179.5, -30]);
    expect(o.x).toBe(0);
    expect(o.y).toBe(0);
    const east = frame.toLocal([-179.5, -30]);
    const ref = WGS84.Inverse(-30, 179.5, -30, -179.5);
    expectClose(
      Math.hypot(east.x, east.y),
      (ref.s12 as number) / 1000,
      1e-6,
      'Karney 2013 geodesic across the 180° meridian',
    );
    expect(east.x).toBeGreaterThan(0);
    const back = frame.toLonLat(east);
    expectClose(back[0], -179.5, 1e-9, 'longitude wrapped into [-180, 180)');
  });

  it('refuses a latitude outside [-90, 90]', () => {
    expect(() => createLocalFrame([0, 95])).toThrow(InvalidInput);
  });
});

describe('frameForStudy', () => {
  const community = (lon: number, lat: number): Community => ({
    id: 'c',
    name: 'C',
    lon,
    lat,
    vs30: 400,
    vs30Basis: 'measured',
    coastal: false,
  });
  const base = {
    name: 's',
    groundMotion: { crustal: [], interface: [], intraslab: [] },
  } as unknown as Study;

  it('centres on the middle of the bounding box of the sources, whatever the communities', () => {
    const point = { ...pointKm(0, 0, FIXED_M7), location: [-148, -45] as const };
    const other = { ...point, location: [-150, -49] as const };
    const frame = frameForStudy({
      ...base,
      communities: [community(-152, -47), community(-151, -49)],
      sources: [point, other],
    });
    expect(frame.origin[0]).toBeCloseTo(-149, 12);
    expect(frame.origin[1]).toBeCloseTo(-47, 12);
    const more = frameForStudy({
      ...base,
      communities: [community(-170, -30)],
      sources: [point, other],
    });
    expect(more.origin).toEqual(frame.origin);
  });

  it('centres a study that straddles the 180° meridian on it', () => {
    const frame = frameForStudy({
      ...base,
      communities: [community(179, -40), community(-179, -42)],
      sources: [],
    });
    expect(Math.abs(frame.origin[0])).toBeCloseTo(180, 12);
    expect(frame.origin[1]).toBeCloseTo(-41, 12);
  });
});
