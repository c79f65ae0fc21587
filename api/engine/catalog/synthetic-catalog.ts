import { InvalidInput, StudyTooLarge } from '../errors.ts';
import type { LonLat } from '../model.ts';
import type { RandomSource } from '../random.ts';
import { DEG_TO_RAD, RAD_TO_DEG } from '../units.ts';
import { MS_PER_YEAR, type CatalogEvent } from './event.ts';
import { binCentre, checkMagnitudeStep } from './magnitude-bins.ts';
import { insideZone, zonePolygon } from './zone-polygon.ts';

export interface SyntheticCatalogOptions {
  /** The seeded generator (api/engine/random.ts); the catalog is a function of its stream. */
  readonly random: RandomSource;
  readonly bValue: number;
  /** Magnitudes are drawn from a Gutenberg–Richter distribution truncated to [mMin, mMax). */
  readonly mMin: number;
  readonly mMax: number;
  /** Exactly one of: how many events, or the annual rate of M >= mMin (a Poisson process). */
  readonly eventCount?: number;
  readonly annualRate?: number;
  /** Zone outline, WGS84 [lon, lat]; epicentres uniform in area inside it. */
  readonly rings: readonly (readonly LonLat[])[];
  /** Depths uniform in [min, max] km. */
  readonly depthKm: readonly [min: number, max: number];
  /** Time span, UTC epoch ms. */
  readonly startMs: number;
  readonly endMs: number;
  /**
   * Round magnitudes to bins of this width, as catalogs report them. To have complete bins from
   * Mc, draw from mMin = Mc − step/2.
   */
  readonly magnitudeStep?: number;
  /** Default "Mw". */
  readonly magnitudeType?: string;
  /** Ids are the prefix and a running number; default "synthetic-". */
  readonly idPrefix?: string;
}

/**
 * Rejection sampling gives up after this many draws per event: a zone filling under 0.1% of its
 * bounding box is better drawn in pieces.
 */
const MAX_DRAWS_PER_EVENT = 1000;

/** A cap on the size of one synthetic catalog (memory, not science). */
const MAX_EVENTS = 1_000_000;

/**
 * A synthetic catalog in time order. Magnitudes by inverting the truncated exponential
 * distribution of Gutenberg–Richter magnitudes (β = b ln 10; e.g. Cornell & Vanmarcke 1969):
 *   M = mMin − ln(1 − u (1 − e^(−β (mMax − mMin)))) / β.
 * Epicentres uniform in area on the sphere: longitude uniform, sine of latitude uniform over the
 * bounding box, kept when inside the zone. Times uniform over the span (given a count), or the
 * gaps of a Poisson process exponential with mean 1/rate (given a rate).
 */
export function syntheticCatalog(options: SyntheticCatalogOptions): CatalogEvent[] {
  const { random, bValue, mMin, mMax, startMs, endMs } = options;
  const [depthMin, depthMax] = options.depthKm;
  const invalid = (path: string, message: string): never => {
    throw new InvalidInput([{ path, message }]);
  };
  if (!(bValue > 0 && Number.isFinite(bValue)))
    invalid('bValue', `expected a b-value greater than 0; got ${bValue}`);
  if (!(Number.isFinite(mMin) && Number.isFinite(mMax) && mMax > mMin))
    invalid('mMax', `expected mMax greater than mMin ${mMin}; got ${mMax}`);
  if (!(Number.isFinite(startMs) && Number.isFinite(endMs) && endMs > startMs))
    invalid('endMs', `expected endMs after startMs; got ${startMs} to ${endMs}`);
  if (!(Number.isFinite(depthMin) && Number.isFinite(depthMax) && depthMax >= depthMin))
    invalid(
      'depthKm',
      `expected [min, max] depths in km with max >= min; got [${depthMin}, ${depthMax}]`,
    );
  if ((options.eventCount === undefined) === (options.annualRate === undefined))
    invalid('eventCount', 'expected exactly one of eventCount and annualRate');
  if (
    options.eventCount !== undefined &&
    !(Number.isInteger(options.eventCount) && options.eventCount >= 0)
  ) {
    invalid('eventCount', `expected a whole number of events; got ${options.eventCount}`);
  }
  if (
    options.annualRate !== undefined &&
    !(options.annualRate >= 0 && Number.isFinite(options.annualRate))
  ) {
    invalid('annualRate', `expected an annual rate of at least 0; got ${options.annualRate}`);
  }
  if (options.magnitudeStep !== undefined) checkMagnitudeStep(options.magnitudeStep);
  const expected =
    options.eventCount ?? ((options.annualRate ?? 0) * (endMs - startMs)) / MS_PER_YEAR;
  if (expected > MAX_EVENTS)
    throw new StudyTooLarge(Math.round(expected), MAX_EVENTS, 'synthetic catalog events');
  const zone = zonePolygon(options.rings);

  const times =
    options.eventCount !== undefined
      ? uniformTimes(random, options.eventCount, startMs, endMs)
      : poissonTimes(random, options.annualRate ?? 0, startMs, endMs);
  const beta = bValue * Math.LN10;
  const span = 1 - Math.exp(-beta * (mMax - mMin));
  const [west, south, east, north] = zone.bbox;
  const sinSouth = Math.sin(south * DEG_TO_RAD);
  const sinNorth = Math.sin(north * DEG_TO_RAD);
  const prefix = options.idPrefix ?? 'synthetic-';
  const width = String(times.length).length;
  return times.map((timeMs, i) => {
    const raw = mMin - Math.log(1 - random.nextFloat() * span) / beta;
    const magnitude =
      options.magnitudeStep === undefined ? raw : binCentre(raw, options.magnitudeStep);
    let lon: number;
    let lat: number;
    for (let draw = 0; ; draw++) {
      if (draw === MAX_DRAWS_PER_EVENT)
        invalid(
          'rings',
          `the zone fills too little of its bounding box to draw epicentres in (no hit in ${MAX_DRAWS_PER_EVENT} draws)`,
        );
      lon = west + (east - west) * random.nextFloat();
      lat = Math.asin(sinSouth + (sinNorth - sinSouth) * random.nextFloat()) * RAD_TO_DEG;
      if (insideZone(zone, lon, lat)) break;
    }
    return {
      id: `${prefix}${String(i + 1).padStart(width, '0')}`,
      timeMs,
      lon,
      lat,
      depthKm: depthMin + (depthMax - depthMin) * random.nextFloat(),
      magnitude,
      magnitudeType: options.magnitudeType ?? 'Mw',
    };
  });
}

function uniformTimes(
  random: RandomSource,
  count: number,
  startMs: number,
  endMs: number,
): number[] {
  const times = Array.from({ length: count }, () =>
    Math.floor(startMs + (endMs - startMs) * random.nextFloat()),
  );
  return times.sort((a, b) => a - b);
}

function poissonTimes(
  random: RandomSource,
  annualRate: number,
  startMs: number,
  endMs: number,
): number[] {
  const times: number[] = [];
  if (annualRate === 0) return times;
  const meanGapMs = MS_PER_YEAR / annualRate;
  for (
    let t = startMs - Math.log(random.nextOpenFloat()) * meanGapMs;
    t < endMs;
    t -= Math.log(random.nextOpenFloat()) * meanGapMs
  ) {
    times.push(Math.floor(t));
  }
  return times;
}
