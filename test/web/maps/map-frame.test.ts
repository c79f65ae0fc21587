import geodesic from 'geographiclib-geodesic';
import { describe, expect, test } from 'vitest';
import type { Community } from '../../../api/engine/model.ts';
import { mapFrame, scaleBarKm } from '../../../web/maps/map-frame.ts';
import { placeLabels } from '../../../web/maps/label-placement.ts';
import { expectClose } from '../../helpers/close.ts';

const WGS84 = geodesic.Geodesic.WGS84;

/** An invented community in open ocean at `lon, lat`. */
const community = (id: string, lon: number, lat: number): Community => ({
  id,
  name: id,
  lon,
  lat,
  vs30: 500,
  vs30Basis: 'measured',
  coastal: false,
});

/** Two communities 60 km either side of (-140, -47) along an azimuth (Karney 2013 direct problem). */
function pair(azimuthDeg: number) {
  const a = WGS84.Direct(-47, -140, azimuthDeg, 60_000);
  const b = WGS84.Direct(-47, -140, azimuthDeg + 180, 60_000);
  return [
    community('a', a.lon2 as number, a.lat2 as number),
    community('b', b.lon2 as number, b.lat2 as number),
  ];
}

describe("the map frame (the engine's azimuthal equidistant frame, scaled to pixels)", () => {
  test('a km on the map is a km of the geodesic (Karney 2013, geographiclib), north up', () => {
    for (const azimuth of [0, 45, 90, 135]) {
      const communities = pair(azimuth);
      const frame = mapFrame(
        { communities, sources: [] },
        { width: 600, maxHeight: 600, padding: 20 },
      );
      const [ax, ay] = frame.project([communities[0]!.lon, communities[0]!.lat]);
      const [bx, by] = frame.project([communities[1]!.lon, communities[1]!.lat]);
      const geodesicKm =
        (WGS84.Inverse(
          communities[0]!.lat,
          communities[0]!.lon,
          communities[1]!.lat,
          communities[1]!.lon,
        ).s12 as number) / 1000;
      // The frame is centred between the two, so both lie on one line through its origin, where
      // azimuthal equidistant distances are exact (Snyder 1987); 1 m covers proj4's rounding.
      expectClose(
        Math.hypot(ax - bx, ay - by) / frame.scale,
        geodesicKm,
        1e-3,
        `geodesic distance, azimuth ${azimuth}`,
      );
      // Azimuth on the map (x right, y down) equals the geodesic azimuth from b to a.
      const mapAzimuth = ((Math.atan2(ax - bx, by - ay) * 180) / Math.PI + 360) % 360;
      expectClose(mapAzimuth, azimuth, 0.05, `map azimuth of the geodesic, azimuth ${azimuth}`);
    }
  });

  test('the frame keeps the data inside the box with its padding', () => {
    const frame = mapFrame(
      { communities: pair(90), sources: [] },
      { width: 600, maxHeight: 400, padding: 20 },
    );
    expect(frame.width).toBe(600);
    const [ax] = frame.project([pair(90)[0]!.lon, pair(90)[0]!.lat]);
    expectClose(ax, 580, 1e-6, 'east community at the right padding');
  });

  test('one community gets a 20 km wide map', () => {
    const frame = mapFrame(
      { communities: [community('only', -140, -47)], sources: [] },
      { width: 420, maxHeight: 420, padding: 10 },
    );
    expectClose(frame.scale, 400 / 20, 1e-9, 'pixels per km for a 20 km span');
  });

  test('GeoJSON becomes SVG path data in the same pixels', () => {
    const communities = pair(90);
    const frame = mapFrame(
      { communities, sources: [] },
      { width: 600, maxHeight: 600, padding: 20 },
    );
    const [ax, ay] = frame.project([communities[0]!.lon, communities[0]!.lat]);
    const d = frame.path({
      type: 'LineString',
      coordinates: [
        [communities[1]!.lon, communities[1]!.lat],
        [communities[0]!.lon, communities[0]!.lat],
      ],
    });
    expect(d).toBe(
      `M20,${ay.toFixed(1).replace(/\.0$/, '')}L${ax.toFixed(1).replace(/\.0$/, '')},${ay.toFixed(1).replace(/\.0$/, '')}`,
    );
  });
});

describe('scale bar length (1, 2 or 5 × 10^k km; common practice)', () => {
  test('the largest round length that fits', () => {
    expect(scaleBarKm(2, 200)).toBe(100);
    expect(scaleBarKm(3, 200)).toBe(50);
    expect(scaleBarKm(0.7, 190)).toBe(200);
    expect(scaleBarKm(50, 190)).toBe(2);
    expect(scaleBarKm(400, 190)).toBe(0.2);
  });

  test('a bar needs positive sizes', () => {
    expect(() => scaleBarKm(0, 100)).toThrow(/expected positive pixels per km/);
  });
});

describe('label placement', () => {
  test('labels of close points do not overlap each other or the markers', () => {
    const labels = [
      { x: 100, y: 100, text: 'Harbour Point', fontSize: 12, clearance: 6 },
      { x: 150, y: 100, text: 'Drumarrow', fontSize: 12, clearance: 6 },
      { x: 125, y: 112, text: 'Saltreach', fontSize: 12, clearance: 6 },
    ];
    const placed = placeLabels(labels, 400, 300);
    const boxes = placed.map((p, i) => {
      const w = labels[i]!.text.length * 12 * 0.6;
      const x0 = p.anchor === 'start' ? p.x : p.anchor === 'end' ? p.x - w : p.x - w / 2;
      return { x0, x1: x0 + w, y0: p.y - 12 * 0.8, y1: p.y + 12 * 0.2 };
    });
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!;
        const b = boxes[j]!;
        const overlaps = a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
        expect(overlaps, `labels ${i} and ${j}`).toBe(false);
      }
      for (const l of labels) {
        const a = boxes[i]!;
        const hitsMarker =
          a.x0 < l.x + l.clearance &&
          l.x - l.clearance < a.x1 &&
          a.y0 < l.y + l.clearance &&
          l.y - l.clearance < a.y1;
        expect(hitsMarker, `label ${i} over the marker at ${l.x},${l.y}`).toBe(false);
      }
    }
  });

  test('a label near the right edge goes to the left of its point', () => {
    const [placed] = placeLabels(
      [{ x: 390, y: 50, text: 'Lisk Head', fontSize: 12, clearance: 6 }],
      400,
      100,
    );
    expect(placed!.anchor).toBe('end');
  });
});
