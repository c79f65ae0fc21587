import fc from 'fast-check';
import { boxRing } from '../helpers/box-ring.ts';
import { lineFeature } from '../helpers/line-feature.ts';

/**
 * fast-check generators of study documents (DESIGN.md section 2) for property tests: small,
 * valid by construction, set in an invented stretch of open ocean around 150° W, 47° S. Names
 * are arbitrary text (markup and control characters included), ids are safe identifiers.
 *
 * Every coordinate is a multiple of 1/64 degree. Such numbers are exact in binary, so sums and
 * differences of them (the bounding box that centres a study's local frame) are exact too,
 * which lets a property add far sources without moving the frame (hazard.properties.test.ts).
 */

export type Doc = Record<string, any>;

/** The grid step of every generated coordinate, degrees. */
export const GRID_DEG = 1 / 64;

const gridIn = (min: number, max: number): fc.Arbitrary<number> =>
  fc
    .integer({ min: Math.round(min / GRID_DEG), max: Math.round(max / GRID_DEG) })
    .map((i) => i * GRID_DEG);

/** A longitude and latitude of the invented region, degrees. */
export const lonArb = gridIn(-150.75, -149.25);
export const latArb = gridIn(-47.5, -46.5);

/** A display name: any text of 1 to 60 characters that is not blank. */
export const nameArb = fc
  .string({ minLength: 1, maxLength: 60, unit: 'binary' })
  .filter((s) => s.trim().length > 0);

/** A number rounded to `digits` decimals, so documents stay readable when printed. */
const rounded = (arb: fc.Arbitrary<number>, digits: number) =>
  arb.map((x) => Number(x.toFixed(digits)));

/** An annual rate, log-uniform from 1e-4 to 1e-1 a year. */
const rateArb = rounded(fc.double({ min: -4, max: -1, noNaN: true }), 3).map((e) =>
  Number((10 ** e).toPrecision(4)),
);
const magnitudeArb = (min: number, max: number) =>
  fc.integer({ min: Math.round(min * 20), max: Math.round(max * 20) }).map((i) => i / 20);

export const fixedRecurrenceArb = fc.record({
  type: fc.constant('fixed'),
  magnitude: magnitudeArb(5, 7.5),
  rate: rateArb,
});

export const grRecurrenceArb = fc
  .record({
    bValue: rounded(fc.double({ min: 0.7, max: 1.3, noNaN: true }), 2),
    mMin: magnitudeArb(4.5, 5.5),
    span: magnitudeArb(0.5, 2.2),
    given: fc.oneof(
      fc.record({ rate: rateArb }),
      fc.record({ aValue: rounded(fc.double({ min: 2, max: 4.5, noNaN: true }), 2) }),
    ),
  })
  .map(({ bValue, mMin, span, given }) => ({
    type: 'gutenberg-richter',
    bValue,
    mMin,
    mMax: Number((mMin + span).toFixed(2)),
    ...given,
  }));

export const momentRecurrenceArb = fc
  .record({
    slipRateMmYr: rounded(fc.double({ min: 0.5, max: 10, noNaN: true }), 2),
    bValue: rounded(fc.double({ min: 0.8, max: 1.2, noNaN: true }), 2),
    mMax: magnitudeArb(6.6, 7.6),
    shape: fc.constantFrom('gutenberg-richter', 'characteristic'),
  })
  .map((r) => ({ type: 'moment-balanced', mMin: 5, ...r }));

const mechanismArb = fc.constantFrom('strike-slip', 'reverse', 'normal');

export function pointSourceArb(id: string): fc.Arbitrary<Doc> {
  return fc
    .record({
      lon: lonArb,
      lat: latArb,
      name: nameArb,
      mechanism: mechanismArb,
      depthKm: fc.integer({ min: 2, max: 25 }),
      recurrence: fc.oneof(fixedRecurrenceArb, grRecurrenceArb),
    })
    .map(({ lon, lat, ...p }) => ({
      type: 'Feature',
      geometry: { type: 'Point', coordinates: [lon, lat] },
      properties: { id, setting: 'crustal', ...p },
    }));
}

/** A straight fault trace of two vertices, 5 to 50 km long, with its dip and depths. */
export function faultSourceArb(id: string): fc.Arbitrary<Doc> {
  return fc
    .record({
      lon: lonArb,
      lat: latArb,
      dx: fc.integer({ min: -16, max: 16 }),
      dy: fc.integer({ min: -16, max: 16 }),
      name: nameArb,
      mechanism: mechanismArb,
      dip: fc.integer({ min: 20, max: 90 }),
      upperDepthKm: fc.integer({ min: 0, max: 5 }),
      thicknessKm: fc.integer({ min: 8, max: 18 }),
      recurrence: fc.oneof(fixedRecurrenceArb, grRecurrenceArb, momentRecurrenceArb),
    })
    .filter(({ dx, dy }) => Math.hypot(dx * 0.68, dy) >= 4)
    .map(({ lon, lat, dx, dy, thicknessKm, upperDepthKm, ...p }) =>
      lineFeature(
        [
          [lon, lat],
          [lon + dx * GRID_DEG, lat + dy * GRID_DEG],
        ],
        { id, setting: 'crustal', upperDepthKm, lowerDepthKm: upperDepthKm + thicknessKm, ...p },
      ),
    );
}

/** A small square zone, 1/8 to 1/4 degree a side. */
export function zoneSourceArb(id: string): fc.Arbitrary<Doc> {
  return fc
    .record({
      lon: lonArb,
      lat: latArb,
      side: fc.integer({ min: 8, max: 16 }),
      name: nameArb,
      mechanism: mechanismArb,
      depthKm: fc.integer({ min: 5, max: 15 }),
      recurrence: fc.oneof(fixedRecurrenceArb, grRecurrenceArb),
    })
    .map(({ lon, lat, side, ...p }) => {
      const d = side * GRID_DEG;
      return {
        type: 'Feature',
        geometry: { type: 'Polygon', coordinates: [boxRing(lon, lat, lon + d, lat + d)] },
        properties: { id, setting: 'crustal', ...p },
      };
    });
}

export function communityArb(id: string): fc.Arbitrary<Doc> {
  return fc
    .record({
      name: nameArb,
      lon: lonArb,
      lat: latArb,
      site: fc.oneof(
        fc.record({ vs30: fc.integer({ min: 180, max: 1400 }) }),
        fc.record({ siteClass: fc.constantFrom('B', 'BC', 'C', 'CD', 'D') }),
      ),
      population: fc.option(fc.integer({ min: 0, max: 5000 }), { nil: undefined }),
      coastal: fc.boolean(),
    })
    .map(({ site, population, ...c }) => ({
      id,
      ...c,
      ...site,
      ...(population === undefined ? {} : { population }),
    }));
}

/** Ground motion and measures that go together: Cornell79 knows PGA only. */
const motionArb = fc.oneof(
  fc.constant({
    groundMotion: { crustal: [{ model: 'Cornell79', weight: 1 }] },
    measures: ['PGA'],
  }),
  fc.subarray(['SA(0.2)', 'SA(1.0)', 'PGV'] as const).map((extra) => ({
    groundMotion: {
      crustal: [
        { model: 'BSSA14', weight: 0.5 },
        { model: 'CB14', weight: 0.5 },
      ],
    },
    measures: ['PGA', ...extra],
  })),
  fc.constant({
    groundMotion: { crustal: [{ model: 'BSSA14', weight: 1 }] },
    measures: ['PGA', 'SA(1.0)'],
  }),
);

export interface StudyArbOptions {
  readonly maxCommunities?: number;
  readonly maxSources?: number;
}

/** A valid study document of 1 to 3 communities and 1 to 3 sources (point, fault, zone). */
export function studyDocArb(options: StudyArbOptions = {}): fc.Arbitrary<Doc> {
  const maxCommunities = options.maxCommunities ?? 3;
  const maxSources = options.maxSources ?? 3;
  const kinds = fc.array(fc.constantFrom('point', 'fault', 'zone'), {
    minLength: 1,
    maxLength: maxSources,
  });
  return fc
    .record({
      name: nameArb,
      communityCount: fc.integer({ min: 1, max: maxCommunities }),
      kinds,
      motion: motionArb,
      truncationSigma: fc.constantFrom(0, 1, 2, 3, 4),
      maxDistanceKm: fc.integer({ min: 60, max: 300 }),
      magnitudeStep: fc.constantFrom(0.1, 0.2, 0.25, 0.5),
      ruptureSpacingKm: fc.constantFrom(5, 7.5, 10),
      zoneCellKm: fc.constantFrom(5, 10),
    })
    .chain((s) =>
      fc
        .record({
          communities: fc.tuple(
            ...Array.from({ length: s.communityCount }, (_, i) => communityArb(`c${i + 1}`)),
          ),
          features: fc.tuple(
            ...s.kinds.map((kind, i) =>
              kind === 'point'
                ? pointSourceArb(`s${i + 1}`)
                : kind === 'fault'
                  ? faultSourceArb(`s${i + 1}`)
                  : zoneSourceArb(`s${i + 1}`),
            ),
          ),
        })
        .map(({ communities, features }) => ({
          name: s.name,
          communities,
          sources: { type: 'FeatureCollection', features },
          groundMotion: s.motion.groundMotion,
          settings: {
            measures: s.motion.measures,
            horizonsYears: [1, 50],
            returnPeriodsYears: [475, 2475],
            truncationSigma: s.truncationSigma,
            maxDistanceKm: s.maxDistanceKm,
            magnitudeStep: s.magnitudeStep,
            ruptureSpacingKm: s.ruptureSpacingKm,
            zoneCellKm: s.zoneCellKm,
          },
        })),
    );
}
