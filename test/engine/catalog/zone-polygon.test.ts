import { describe, expect, it } from 'vitest';
import { insideZone, zonePolygon } from '../../../api/engine/catalog/zone-polygon.ts';
import { boxRing } from '../../helpers/box-ring.ts';

describe('zone polygons', () => {
  it('close an open ring and find its bounding box', () => {
    // The square of the catalog tests without its closing point.
    const z = zonePolygon([boxRing(-150, -48, -148, -46).slice(0, 4)]);
    expect(z.geometry.coordinates[0]).toHaveLength(5);
    expect(z.bbox).toEqual([-150, -48, -148, -46]);
  });

  it('tell inside from outside, holes and boundary included', () => {
    const z = zonePolygon([boxRing(-150, -48, -148, -46), boxRing(-149.5, -47.5, -148.5, -46.5)]);
    expect(insideZone(z, -149.8, -47.9)).toBe(true);
    expect(insideZone(z, -149, -47)).toBe(false); // in the hole
    expect(insideZone(z, -147.9, -47)).toBe(false);
    expect(insideZone(z, -150, -47)).toBe(true); // on the boundary
  });

  it('name the bad ring or point', () => {
    expect(() => zonePolygon([])).toThrow(/outer ring/);
    expect(() =>
      zonePolygon([
        [
          [-150, -48],
          [-148, -95],
          [-148, -46],
        ],
      ]),
    ).toThrow(/rings\[0\]\[1\]/);
    expect(() =>
      zonePolygon([
        [
          [-150, -48],
          [-148, -48],
          [-150, -48],
        ],
      ]),
    ).toThrow(/at least 3 distinct points/);
  });
});
