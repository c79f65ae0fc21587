import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import type { Study } from '../../../api/engine/model.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import type { CommunityResult } from '../../../api/engine/results.ts';
import { screenStudy } from '../../../api/engine/screen-study.ts';
import { loadStudy } from '../../../api/study/load-study.ts';
import { lineFeature } from '../../helpers/line-feature.ts';
import { referenceScreening } from '../../helpers/reference-hazard/reference-screening.ts';
import {
  type Doc,
  fixedRecurrenceArb,
  grRecurrenceArb,
  studyDocArb,
} from '../../study/arbitrary-study.ts';

/**
 * Invariants of the hazard integral on generated studies (fast-check), on the engine and on
 * the plain sum it is checked against (test/helpers/reference-hazard/). The invariants follow
 * from the definition of classical PSHA, λ(IM > x) = Σ rate × P(IM > x | rupture) (Cornell 1968; Baker 2008, "An
 * introduction to probabilistic seismic hazard analysis", the hazard integral; from memory):
 * - every term is a rate (>= 0) times a probability that falls as x rises, so each curve is
 *   non-negative and non-increasing in x;
 * - λ is linear in the rates, so doubling every source's rate doubles every exceedance rate;
 * - ruptures beyond the integration cut-off (Rjb > maxDistanceKm) add no term, so a source
 *   wholly beyond it changes no number;
 * - deaggregation (McGuire 1995) splits λ at one level into shares that sum to 1.
 * The generated studies are invented test inputs; no check value comes from them.
 */

/** The engine's screening and the plain sum it is checked against (test/helpers/reference-hazard/). */
const PATHS = ['engine', 'reference'] as const;
type SumPath = (typeof PATHS)[number];
/** Runs per property and path: small studies screen in milliseconds, so 40 cost a few seconds. */
const RUNS = 40;
/** Fixed seed so a failure reproduces; fast-check prints the seed and the shrunk counterexample. */
const SEED = 20_240_817;

/** Checks `check` on RUNS generated studies drawn from SEED. */
const forEachStudy = (check: (doc: Doc) => void) =>
  fc.assert(fc.property(studyDocArb(), check), { numRuns: RUNS, seed: SEED });

const figures: string[] = [];
afterAll(() =>
  console.log(
    `engine properties (seed ${SEED}, ${RUNS} studies per property and path):\n  ${figures.join('\n  ')}`,
  ),
);

function toStudy(doc: Doc): Study {
  const loaded = loadStudy(doc, { models: modelCatalog });
  if (!loaded.ok)
    throw new Error(
      `a generated study should be valid: ${loaded.issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`,
    );
  return loaded.study;
}

const screen = (doc: Doc, path: SumPath) =>
  (path === 'engine' ? screenStudy : referenceScreening)(toStudy(doc), { models: modelCatalog });

/** Every mean and branch curve of a community, with a label for messages. */
function* curvesOf(c: CommunityResult): Generator<[string, readonly number[], readonly number[]]> {
  for (const [key, curve] of Object.entries(c.curves)) {
    yield [`${c.communityId} ${key} mean`, curve.levels, curve.annualRate];
    for (const b of curve.branches ?? [])
      yield [`${c.communityId} ${key} ${b.label}`, curve.levels, b.annualRate];
  }
}

/**
 * Curves are sums of many terms by compensated summation; a sum at a higher level has the
 * same or smaller terms, so it can exceed its neighbour only by the summation's rounding,
 * a few units in the last place: 1e-12 relative covers that with room.
 */
const ROUNDING = 1e-12;

describe.each(PATHS)('hazard curves (%s path)', (path) => {
  it('are finite, non-negative and non-increasing, and so are the chances of exceeding', () => {
    let curves = 0;
    forEachStudy((doc) => {
      const result = screen(doc, path);
      for (const c of result.communities) {
        for (const [label, levels, rates] of curvesOf(c)) {
          curves++;
          expect(rates.length, label).toBe(levels.length);
          rates.forEach((r, i) => {
            expect(Number.isFinite(r) && r >= 0, `${label}: rate ${r} at level ${levels[i]}`).toBe(
              true,
            );
            const previous = rates[i - 1];
            if (previous !== undefined)
              expect(
                r <= previous * (1 + ROUNDING),
                `${label}: ${r} at ${levels[i]} after ${previous}`,
              ).toBe(true);
          });
        }
        for (const [years, byMeasure] of Object.entries(c.chanceOfExceeding)) {
          for (const [key, chances] of Object.entries(byMeasure)) {
            chances.forEach((p, i) => {
              expect(p >= 0 && p <= 1, `${c.communityId} ${key} ${years} yr: chance ${p}`).toBe(
                true,
              );
              const previous = chances[i - 1];
              if (previous !== undefined) expect(p <= previous * (1 + ROUNDING)).toBe(true);
            });
          }
        }
      }
    });
    figures.push(`${path}: ${curves} curves non-negative and non-increasing`);
  });

  it('deaggregation shares by source and by M–R–ε bin each sum to 1', () => {
    let checked = 0;
    forEachStudy((doc) => {
      for (const c of screen(doc, path).communities) {
        for (const [years, d] of Object.entries(c.deaggregation)) {
          checked++;
          const label = `${c.communityId} at ${years} years`;
          for (const share of [...d.bySource.map((s) => s.share), ...d.bins.map((b) => b.share)]) {
            expect(share >= 0 && share <= 1 + ROUNDING, `${label}: share ${share}`).toBe(true);
          }
          // Shares are ratios of compensated sums: their sum is 1 to a few units in the last place.
          const bySource = d.bySource.reduce((s, x) => s + x.share, 0);
          const byBin = d.bins.reduce((s, x) => s + x.share, 0);
          expect(Math.abs(bySource - 1), `${label}: source shares sum to ${bySource}`).toBeLessThan(
            1e-9,
          );
          expect(Math.abs(byBin - 1), `${label}: bin shares sum to ${byBin}`).toBeLessThan(1e-9);
        }
      }
    });
    figures.push(`${path}: ${checked} deaggregations with shares summing to 1`);
    // Without any deaggregation the property would hold vacuously.
    expect(checked).toBeGreaterThan(0);
  });
});

/** The same study with every source's rate doubled, in the form the source states it. */
function doubledRates(doc: Doc): Doc {
  const copy = structuredClone(doc);
  for (const feature of copy.sources.features as Doc[]) {
    const r = feature.properties.recurrence as Doc;
    if (r.type === 'fixed') r.rate *= 2;
    else if (r.type === 'moment-balanced')
      r.slipRateMmYr *= 2; // moment rate, hence every rate, doubles
    else if (r.rate !== undefined) r.rate *= 2;
    else r.aValue += Math.log10(2);
  }
  return copy;
}

/**
 * Doubling is exact in binary for rates and slip rates; a-values add log10(2), whose rounding
 * and the summation's leave differences of about 1e-15 relative. 1e-9 is far above those and
 * far below any change of method.
 */
const LINEARITY = 1e-9;

describe.each(PATHS)('linearity in the rates (%s path)', (path) => {
  it('doubling every rate doubles every exceedance rate', () => {
    let compared = 0;
    forEachStudy((doc) => {
      const once = screen(doc, path).communities;
      const twice = screen(doubledRates(doc), path).communities;
      once.forEach((c, ci) => {
        const d = twice[ci] as CommunityResult;
        const doubled = [...curvesOf(d)];
        [...curvesOf(c)].forEach(([label, , rates], k) => {
          const other = (doubled[k] as [string, readonly number[], readonly number[]])[2];
          rates.forEach((r, i) => {
            compared++;
            const got = other[i] as number;
            expect(
              Math.abs(got - 2 * r) <= LINEARITY * 2 * r,
              `${label}: ${got} for twice ${r}`,
            ).toBe(true);
          });
        });
      });
    });
    figures.push(`${path}: ${compared} exceedance rates doubled with the rates`);
  });
});

/**
 * Far sources for `doc`: one point source and one fault at least 8° of longitude beyond each
 * side of the study's extent (over 540 km at 47° S, beyond any generated cut-off of at most
 * 300 km), on the middle latitude. The local frame is centred on the middle of the bounding box
 * of the sources' coordinates, the communities' when there are none (geometry/projection.ts),
 * so sources added symmetrically about that middle leave it where it was; with coordinates on a
 * 1/64° grid this holds exactly. (A far source on one side only would move the frame and so
 * change distances by the projection's distortion, parts in 10^4.)
 */
function withFarSources(doc: Doc, recurrences: readonly [Doc, Doc]): Doc {
  const copy = structuredClone(doc);
  const lons: number[] = [];
  const lats: number[] = [];
  const visit = (x: unknown): void => {
    if (Array.isArray(x) && typeof x[0] === 'number') {
      lons.push(x[0]);
      lats.push(x[1] as number);
    } else if (Array.isArray(x)) x.forEach(visit);
  };
  for (const f of copy.sources.features as Doc[]) visit(f.geometry.coordinates);
  if (lons.length === 0) for (const c of copy.communities as Doc[]) visit([c.lon, c.lat]);
  const allLons = [...lons, ...copy.communities.map((c: Doc) => c.lon as number)];
  const reach =
    8 +
    Math.max(Math.min(...lons) - Math.min(...allLons), Math.max(...allLons) - Math.max(...lons));
  const west = Math.min(...lons) - reach;
  const east = Math.max(...lons) + reach;
  const midLat = (Math.min(...lats) + Math.max(...lats)) / 2;
  copy.sources.features.push(
    {
      type: 'Feature',
      geometry: { type: 'Point', coordinates: [west, midLat] },
      properties: {
        id: 'far-west',
        setting: 'crustal',
        mechanism: 'reverse',
        depthKm: 10,
        recurrence: recurrences[0],
      },
    },
    lineFeature(
      [
        [east, midLat],
        [east - 0.25, midLat],
      ],
      {
        id: 'far-east',
        setting: 'crustal',
        mechanism: 'strike-slip',
        dip: 90,
        lowerDepthKm: 15,
        recurrence: recurrences[1],
      },
    ),
  );
  return copy;
}

describe.each(PATHS)('the distance cut-off (%s path)', (path) => {
  it('a source beyond the cut-off changes no curve, level, chance, intensity or deaggregation', () => {
    let studies = 0;
    fc.assert(
      fc.property(
        studyDocArb(),
        fc.tuple(
          fc.oneof(fixedRecurrenceArb, grRecurrenceArb),
          fc.oneof(fixedRecurrenceArb, grRecurrenceArb),
        ),
        (doc, recurrences) => {
          const before = screen(doc, path).communities;
          const after = screen(withFarSources(doc, recurrences), path).communities;
          studies++;
          before.forEach((c, i) => {
            const a = after[i] as CommunityResult;
            expect(a.curves).toEqual(c.curves);
            expect(a.atReturnPeriod).toEqual(c.atReturnPeriod);
            expect(a.chanceOfExceeding).toEqual(c.chanceOfExceeding);
            expect(a.intensity).toEqual(c.intensity);
            expect(a.deaggregation).toEqual(c.deaggregation);
            expect(a.band).toEqual(c.band);
          });
        },
      ),
      { numRuns: RUNS, seed: SEED },
    );
    figures.push(`${path}: ${studies} studies unchanged by two sources beyond the cut-off`);
  });
});
