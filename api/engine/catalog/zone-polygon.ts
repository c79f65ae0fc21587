import { booleanPointInPolygon } from '@turf/turf';
import type { Polygon } from 'geojson';
import { InvalidInput } from '../errors.ts';
import type { LonLat } from '../model.ts';

/**
 * A zone outline for catalog work: rings as in a ZoneSource (outer ring first, then holes),
 * WGS84 [lon, lat] degrees. Inside-tests use turf's booleanPointInPolygon, which treats edges as
 * straight lines in longitude and latitude (as GeoJSON does, RFC 7946 section 3.1.1) and counts
 * points on the boundary as inside. Zones must not cross the antimeridian.
 */
export interface ZonePolygon {
  readonly geometry: Polygon;
  /** Bounding box of the outer ring: [west, south, east, north], degrees. */
  readonly bbox: readonly [number, number, number, number];
}

/** Checks and closes the rings; throws InvalidInput naming the bad ring or point. */
export function zonePolygon(rings: readonly (readonly LonLat[])[], path = 'rings'): ZonePolygon {
  if (rings.length === 0)
    throw new InvalidInput([{ path, message: 'expected at least an outer ring' }]);
  const closed = rings.map((ring, r) => {
    ring.forEach(([lon, lat], i) => {
      if (!(
        Number.isFinite(lon) &&
        lon >= -180 &&
        lon <= 180 &&
        Number.isFinite(lat) &&
        lat >= -90 &&
        lat <= 90
      )) {
        throw new InvalidInput([
          {
            path: `${path}[${r}][${i}]`,
            message: `expected [lon, lat] in degrees within ±180, ±90; got [${lon}, ${lat}]`,
          },
        ]);
      }
    });
    const first = ring[0];
    const last = ring[ring.length - 1];
    const points = ring.map(([lon, lat]) => [lon, lat]);
    if (first && last && (first[0] !== last[0] || first[1] !== last[1]))
      points.push([first[0], first[1]]);
    if (points.length < 4)
      throw new InvalidInput([
        {
          path: `${path}[${r}]`,
          message: `expected a ring of at least 3 distinct points; got ${ring.length} points`,
        },
      ]);
    return points;
  });
  const outer = closed[0] as number[][];
  const lons = outer.map((p) => p[0] as number);
  const lats = outer.map((p) => p[1] as number);
  return {
    geometry: { type: 'Polygon', coordinates: closed },
    bbox: [Math.min(...lons), Math.min(...lats), Math.max(...lons), Math.max(...lats)],
  };
}

/** True when the epicentre (degrees) lies inside the zone or on its boundary. */
export const insideZone = (zone: ZonePolygon, lon: number, lat: number): boolean =>
  booleanPointInPolygon([lon, lat], zone.geometry);
