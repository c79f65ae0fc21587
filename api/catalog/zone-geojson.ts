import { zonePolygon } from '../engine/catalog/zone-polygon.ts';
import { InvalidInput } from '../engine/errors.ts';
import type { LonLat } from '../engine/model.ts';
import { describeValue } from '../study/fields.ts';

/**
 * A zone outline from GeoJSON (RFC 7946, WGS84 [lon, lat]): a Polygon geometry, a Feature
 * holding one (a zone source of a study, say), or a FeatureCollection of exactly one such
 * Feature (what a map program saves for one drawn shape). A third coordinate (elevation) is
 * allowed and ignored. Returns the rings, outer first; throws InvalidInput naming the place.
 */
export function readZonePolygon(value: unknown, path = 'polygon'): LonLat[][] {
  const fail = (where: string, message: string): never => {
    throw new InvalidInput([{ path: where, message }], 'invalid zone polygon');
  };
  const object = (v: unknown): Record<string, unknown> | undefined =>
    typeof v === 'object' && v !== null && !Array.isArray(v)
      ? (v as Record<string, unknown>)
      : undefined;
  let geometry = object(value);
  let where = path;
  if (geometry?.type === 'FeatureCollection') {
    const features = Array.isArray(geometry.features) ? geometry.features : [];
    if (features.length !== 1)
      fail(
        `${path}.features`,
        `expected exactly one Feature with the zone polygon; got ${features.length}`,
      );
    geometry = object(features[0]);
    where = `${path}.features[0]`;
  }
  if (geometry?.type === 'Feature') {
    geometry = object(geometry.geometry);
    where = `${where}.geometry`;
  }
  if (geometry?.type !== 'Polygon') {
    const got = geometry ? describeValue(geometry.type) : describeValue(value);
    fail(
      `${where}.type`,
      `expected a GeoJSON Polygon (or a Feature or one-feature FeatureCollection holding one); got ${got}`,
    );
  }
  const coordinates = (geometry as Record<string, unknown>).coordinates;
  if (!Array.isArray(coordinates))
    fail(
      `${where}.coordinates`,
      `expected a list of rings of [lon, lat] positions; got ${describeValue(coordinates)}`,
    );
  const rings = (coordinates as unknown[]).map((ring, r): LonLat[] => {
    if (!Array.isArray(ring))
      fail(
        `${where}.coordinates[${r}]`,
        `expected a ring: a list of [lon, lat] positions; got ${describeValue(ring)}`,
      );
    return (ring as unknown[]).map((position, i): LonLat => {
      const ok =
        Array.isArray(position) &&
        position.length >= 2 &&
        position.length <= 3 &&
        position.every((x) => typeof x === 'number' && Number.isFinite(x));
      if (!ok)
        fail(
          `${where}.coordinates[${r}][${i}]`,
          `expected a position [lon, lat] in degrees; got ${describeValue(position)}`,
        );
      return [(position as number[])[0] as number, (position as number[])[1] as number];
    });
  });
  // Ranges, ring sizes and closure as every catalog zone is checked.
  zonePolygon(rings, `${where}.coordinates`);
  return rings;
}
