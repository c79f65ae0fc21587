import fc from 'fast-check';
import { expect } from 'vitest';
import type { TectonicSetting } from '../../../api/engine/model.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { measureLabel } from '../../../api/engine/motion/measure.ts';
import { createPairPredictions } from '../../../api/engine/motion/prepared-period.ts';
import { expectClose } from '../../helpers/close.ts';
import type {
  DistanceContext,
  GroundMotionModel,
  PairDistances,
  RuptureContext,
  SiteContext,
} from '../../../api/engine/motion/types.ts';

/**
 * Checks that a model's precomputation hook (GroundMotionModel.prepare) gives predict()'s
 * numbers: for generated ruptures, distances and sites, each pair's ln median and σ must agree
 * within TOLERANCE and `applicable` must be the same flag. The hook computes every term by
 * predict()'s expressions, except √(a² + b²) for Math.hypot, which can
 * move the last bit or two; 1e-12 in ln units (a relative 1e-12 of the median) is a thousand
 * times that and a million times below anything a hazard curve could show. Not a check of the science:
 * the model's own tests check predict() against published values; this only ties the fast
 * path to it. Inputs roam beyond each model's validity, so both sides of every range and every
 * branch (hanging wall, nonlinear site, magnitude hinges) are visited.
 */

export interface PairCase {
  readonly rupture: RuptureContext;
  readonly distances: DistanceContext;
}

const settingArb = fc.constantFrom<TectonicSetting>('crustal', 'interface', 'intraslab');

const ruptureArb = (settings: readonly TectonicSetting[]): fc.Arbitrary<RuptureContext> =>
  fc.record({
    magnitude: fc.oneof(
      fc.double({ min: 2.5, max: 9.5, noNaN: true }),
      fc.constantFrom(4.5, 5.5, 6.5, 7.2, 7.5, 7.8, 8.0),
    ),
    rakeDeg: fc.oneof(
      fc.double({ min: -180, max: 180, noNaN: true }),
      fc.constantFrom(0, 90, -90, 30, 150, -30, -150, 180),
    ),
    mechanism: fc.constantFrom('strike-slip' as const, 'reverse' as const, 'normal' as const),
    setting: settings.length === 3 ? settingArb : fc.constantFrom(...settings),
    dipDeg: fc.oneof(fc.double({ min: 10, max: 90, noNaN: true }), fc.constantFrom(15, 45, 90)),
    ztorKm: fc.oneof(fc.double({ min: 0, max: 25, noNaN: true }), fc.constantFrom(0, 16.66, 20)),
    widthKm: fc.double({ min: 0, max: 60, noNaN: true }),
    hypoDepthKm: fc.oneof(
      fc.double({ min: 0, max: 160, noNaN: true }),
      fc.constantFrom(7, 20, 60, 120),
    ),
  });

const distancesArb: fc.Arbitrary<DistanceContext> = fc
  .record({
    rjbKm: fc.oneof(
      fc.double({ min: 0, max: 450, noNaN: true }),
      fc.constantFrom(0, 1, 80, 300, 400),
    ),
    extraKm: fc.double({ min: 0, max: 40, noNaN: true }),
    rxKm: fc.oneof(fc.double({ min: -150, max: 150, noNaN: true }), fc.constant(0)),
    ry0Km: fc.double({ min: 0, max: 60, noNaN: true }),
    depthKm: fc.double({ min: 0, max: 150, noNaN: true }),
  })
  .map(({ rjbKm, extraKm, rxKm, ry0Km, depthKm }) => ({
    rjbKm,
    rrupKm: rjbKm + extraKm,
    rxKm,
    ry0Km,
    rhypoKm: Math.hypot(rjbKm, depthKm),
    repiKm: rjbKm,
  }));

export const siteArb: fc.Arbitrary<SiteContext> = fc.record(
  {
    vs30: fc.oneof(
      fc.double({ min: 120, max: 2000, noNaN: true }),
      fc.constantFrom(150, 225, 300, 360, 450, 760, 865, 1000, 1100, 1500),
    ),
    vs30Measured: fc.boolean(),
    z2p5Km: fc.double({ min: 0, max: 12, noNaN: true }),
  },
  { requiredKeys: ['vs30', 'vs30Measured'] },
);

export const pairCasesArb = (settings: readonly TectonicSetting[]): fc.Arbitrary<PairCase[]> =>
  fc.array(fc.record({ rupture: ruptureArb(settings), distances: distancesArb }), {
    minLength: 1,
    maxLength: 12,
  });

/** The pairs as columns, rupture k paired with distances k. */
export function pairColumns(cases: readonly PairCase[]): PairDistances {
  const column = (pick: (d: DistanceContext) => number) =>
    Float64Array.from(cases, (c) => pick(c.distances));
  return {
    count: cases.length,
    rupture: Int32Array.from(cases, (_, k) => k),
    rjbKm: column((d) => d.rjbKm),
    rrupKm: column((d) => d.rrupKm),
    rxKm: column((d) => d.rxKm),
    ry0Km: column((d) => d.ry0Km),
    rhypoKm: column((d) => d.rhypoKm),
    repiKm: column((d) => d.repiKm),
  };
}

/** Largest difference allowed between the hook's and predict()'s ln median and σ (ln units). */
export const TOLERANCE = 1e-12;

/** Asserts the hook's predictions equal predict()'s for every pair, within TOLERANCE. */
export function expectPreparedEqualsPredict(
  model: GroundMotionModel,
  measure: Measure,
  cases: readonly PairCase[],
  site: SiteContext,
): void {
  const prepared = model.prepare!(
    cases.map((c) => c.rupture),
    measure,
  );
  const out = createPairPredictions(cases.length);
  prepared.predictPairs(site, pairColumns(cases), out);
  cases.forEach((c, k) => {
    const expected = model.predict({ ...c.rupture, ...c.distances, ...site }, measure);
    const where = `${model.name} ${measureLabel(measure)} pair ${k}: ${JSON.stringify({ ...c.rupture, ...c.distances, ...site })}`;
    expectClose(
      out.lnMedian[k]!,
      expected.lnMedian,
      TOLERANCE,
      `${where}: ln median against predict()`,
    );
    expectClose(out.sigma[k]!, expected.sigma, TOLERANCE, `${where}: sigma against predict()`);
    expect(
      out.applicable[k] === 1,
      `${where}: applicable vs predict ${expected.applicable} (${expected.notes.join('; ')})`,
    ).toBe(expected.applicable);
  });
}

/** Runs the check over generated cases for each measure (fast-check, fixed seed so a failure repeats). */
export function checkPreparedModel(
  model: GroundMotionModel,
  measures: readonly Measure[],
  settings: readonly TectonicSetting[],
  numRuns = 150,
): void {
  for (const measure of measures) {
    fc.assert(
      fc.property(pairCasesArb(settings), siteArb, (cases, site) =>
        expectPreparedEqualsPredict(model, measure, cases, site),
      ),
      { numRuns, seed: 20_260_701 },
    );
  }
}

/**
 * Checks that a model's prepareMeasures hook, preparing `measures` together, gives for each
 * measure exactly what its prepare hook gives for that measure alone (the shared per-pair work
 * must not change a number; same fixed seed as checkPreparedModel).
 */
export function checkPreparedMeasures(
  model: GroundMotionModel,
  measures: readonly Measure[],
  settings: readonly TectonicSetting[],
  numRuns = 60,
): void {
  fc.assert(
    fc.property(pairCasesArb(settings), siteArb, (cases, site) => {
      const ruptures = cases.map((c) => c.rupture);
      const pairs = pairColumns(cases);
      const together = measures.map(() => createPairPredictions(cases.length));
      model.prepareMeasures!(ruptures, measures).predictPairs(site, pairs, together);
      measures.forEach((measure, i) => {
        const alone = createPairPredictions(cases.length);
        model.prepare!(ruptures, measure).predictPairs(site, pairs, alone);
        const where = `${model.name} ${measureLabel(measure)} prepared with ${measures.map(measureLabel).join(', ')}`;
        expect(Array.from(together[i]!.lnMedian), `${where}: ln median`).toEqual(
          Array.from(alone.lnMedian),
        );
        expect(Array.from(together[i]!.sigma), `${where}: sigma`).toEqual(Array.from(alone.sigma));
        expect(Array.from(together[i]!.applicable), `${where}: applicable`).toEqual(
          Array.from(alone.applicable),
        );
      });
    }),
    { numRuns, seed: 20_260_702 },
  );
}

/** Sites met one after another by one prepared model: below and above k1 and 1130 m/s, back again, with a Z1 and Z2.5 given, measured and not. */
const SITE_SEQUENCE: readonly SiteContext[] = [
  { vs30: 760, vs30Measured: false },
  { vs30: 760, vs30Measured: false },
  { vs30: 300, vs30Measured: true },
  { vs30: 1200, vs30Measured: false },
  { vs30: 760, vs30Measured: false, z1Km: 0.3, z2p5Km: 4 },
  { vs30: 760, vs30Measured: false },
  { vs30: 180, vs30Measured: false },
];

/**
 * Checks that one prepared model (what a map keeps from point to point) gives predict()'s numbers
 * within TOLERANCE at sites of one Vs30 after another: terms a model works out once per Vs30 must
 * follow the site.
 */
export function checkPreparedAcrossSites(
  model: GroundMotionModel,
  measures: readonly Measure[],
  setting: TectonicSetting,
): void {
  const cases = fc.sample(pairCasesArb([setting]), { numRuns: 1, seed: 20_260_703 })[0]!;
  for (const measure of measures) {
    const prepared = model.prepare!(
      cases.map((c) => c.rupture),
      measure,
    );
    for (const site of SITE_SEQUENCE) {
      const out = createPairPredictions(cases.length);
      prepared.predictPairs(site, pairColumns(cases), out);
      cases.forEach((c, k) => {
        const expected = model.predict({ ...c.rupture, ...c.distances, ...site }, measure);
        const where = `${model.name} ${measureLabel(measure)} pair ${k} at ${JSON.stringify(site)}`;
        expectClose(out.lnMedian[k]!, expected.lnMedian, TOLERANCE, `${where}: ln median`);
        expectClose(out.sigma[k]!, expected.sigma, TOLERANCE, `${where}: sigma`);
      });
    }
  }
}

/**
 * Checks that a model's numbers at each of `sites` do not depend on the site asked before (a
 * model may keep parts of the last site's terms): each site's prediction alone, after another
 * site, must be exactly that site's in a run over all sites twice, and the sites must differ.
 */
export function checkSiteOrder(model: GroundMotionModel, sites: readonly SiteContext[]): void {
  const rupture: RuptureContext = {
    magnitude: 6.5,
    rakeDeg: 90,
    mechanism: 'reverse',
    setting: 'crustal',
    dipDeg: 45,
    ztorKm: 2,
    widthKm: 15,
    hypoDepthKm: 9,
  };
  const distances = { rjbKm: 12, rrupKm: 14, rxKm: 8, ry0Km: 0, rhypoKm: 16, repiKm: 13 };
  const predictAt = (site: SiteContext, measure: Measure) =>
    model.predict({ ...rupture, ...distances, ...site }, measure);
  const measures: Measure[] = [
    { kind: 'PGA' },
    { kind: 'SA', periodS: 0.1 },
    { kind: 'SA', periodS: 1 },
  ];
  const alone = measures.map((measure) =>
    sites.map((site, i) => {
      predictAt(sites[(i + 1) % sites.length]!, measure);
      return predictAt(site, measure);
    }),
  );
  measures.forEach((measure, m) => {
    [...sites, ...sites].forEach((site, i) => {
      const p = predictAt(site, measure);
      const expected = alone[m]![i % sites.length]!;
      expect(p.lnMedian, `${model.name} ${measureLabel(measure)} site ${i}`).toBe(
        expected.lnMedian,
      );
      expect(p.sigma).toBe(expected.sigma);
    });
  });
  // Every site differs from the others in some measure's median or σ: a stale site part would show.
  const bySite = sites.map((_, i) =>
    alone.map((row) => `${row[i]!.lnMedian} ${row[i]!.sigma}`).join(' '),
  );
  expect(new Set(bySite).size).toBe(sites.length);
}
