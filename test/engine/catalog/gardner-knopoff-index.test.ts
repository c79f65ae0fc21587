import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { MS_PER_DAY, type CatalogEvent } from '../../../api/engine/catalog/event.ts';
import { declusterGardnerKnopoff } from '../../../api/engine/catalog/gardner-knopoff.ts';
import { createRandom, type RandomSource } from '../../../api/engine/random.ts';
import { declusterGardnerKnopoffByScan } from '../../helpers/gardner-knopoff-oracle.ts';

/**
 * The indexed declustering must give exactly what the plain scan of every event in each time
 * window gives (test/helpers/gardner-knopoff-oracle.ts): same mainshocks, same removed events
 * with the same mainshock, distance and time, in the same order. Catalogs are seeded and
 * clustered, with ties in time and magnitude, and placed where longitude and latitude misbehave
 * (the antimeridian, next to a pole).
 */
const WGS84 = geodesic.Geodesic.WGS84;
const T0 = Date.UTC(2001, 0, 1);

/**
 * Background events uniform in a box of ±`spanDeg` around the centre over two years, and
 * sequences: a third of the events placed 0–80 km and 0–400 days from an earlier one, on whole
 * days (time ties). Magnitudes on 0.1 steps (magnitude ties), Gutenberg–Richter b = 1 from 2.5.
 */
function clusteredCatalog(
  random: RandomSource,
  count: number,
  centreLon: number,
  centreLat: number,
  spanDeg: number,
): CatalogEvent[] {
  const events: CatalogEvent[] = [];
  const magnitude = (): number =>
    Math.round((2.5 - Math.log10(1 - random.nextFloat() * 0.9999)) * 10) / 10;
  for (let k = 0; k < count; k++) {
    const id = `e${k}`;
    const type = random.nextFloat() < 0.05 ? 'ML' : 'Mw';
    if (k > 0 && random.nextFloat() < 1 / 3) {
      const parent = events[Math.floor(random.nextFloat() * events.length)] as CatalogEvent;
      const p = WGS84.Direct(
        parent.lat,
        parent.lon,
        360 * random.nextFloat(),
        80_000 * random.nextFloat(),
      );
      const days = Math.floor(400 * random.nextFloat());
      events.push({
        id,
        timeMs: parent.timeMs + days * MS_PER_DAY,
        lon: p.lon2 ?? NaN,
        lat: p.lat2 ?? NaN,
        depthKm: 10,
        magnitude: magnitude(),
        magnitudeType: type,
      });
    } else {
      const lat = Math.max(-90, Math.min(90, centreLat + spanDeg * (2 * random.nextFloat() - 1)));
      const lon = ((centreLon + spanDeg * (2 * random.nextFloat() - 1) + 540) % 360) - 180;
      const timeMs =
        T0 +
        Math.floor(730 * random.nextFloat()) * MS_PER_DAY +
        (random.nextFloat() < 0.5 ? 0 : Math.floor(86_400_000 * random.nextFloat()));
      events.push({
        id,
        timeMs,
        lon,
        lat,
        depthKm: 10,
        magnitude: magnitude(),
        magnitudeType: type,
      });
    }
  }
  return events;
}

const places: [string, number, number, number][] = [
  ['open ocean', -150, -47, 2],
  ['across the antimeridian', 180, -50, 2],
  ['next to the south pole', 0, -89.6, 0.4],
  ['wide', -140, -40, 8],
];

describe('indexed Gardner & Knopoff declustering', () => {
  for (const [where, lon, lat, span] of places) {
    it(`matches the plain scan ${where}`, () => {
      for (const seed of [1, 2, 3]) {
        const events = clusteredCatalog(createRandom(seed), 3000, lon, lat, span);
        for (const options of [{}, { removeForeshocks: false }, { magnitudes: 'all' as const }]) {
          const indexed = declusterGardnerKnopoff(events, options);
          const scanned = declusterGardnerKnopoffByScan(events, options);
          // A catalog with nothing removed would prove little.
          expect(scanned.removed.length).toBeGreaterThan(50);
          expect(indexed).toEqual(scanned);
        }
      }
    });
  }

  it('matches the plain scan on an empty catalog and on one event', () => {
    expect(declusterGardnerKnopoff([])).toEqual(declusterGardnerKnopoffByScan([]));
    const one = clusteredCatalog(createRandom(9), 1, -150, -47, 1);
    expect(declusterGardnerKnopoff(one)).toEqual(declusterGardnerKnopoffByScan(one));
  });
});
