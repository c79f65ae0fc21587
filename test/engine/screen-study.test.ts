import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import { Cancelled, InvalidInput, UnknownModel } from '../../api/engine/errors.ts';
import { ruptureDistances } from '../../api/engine/geometry/distances.ts';
import { mmiFromPga } from '../../api/engine/intensity/worden2012.ts';
import type { Community, FaultSource, Study, ZoneSource } from '../../api/engine/model.ts';
import { normalSurvival } from '../../api/engine/hazard/normal-cdf.ts';
import { cornell79LnPga } from '../../api/engine/motion/cornell79.ts';
import { discretiseStudy } from '../../api/engine/ruptures/discretise.ts';
import { screenStudy } from '../../api/engine/screen-study.ts';
import { expectClose, expectRelative } from '../helpers/close.ts';
import { allKindsStudy } from './fixtures/all-kinds-study.ts';
import { boxRing } from '../helpers/box-ring.ts';
import { expectSharesSumToOne } from '../helpers/deaggregation-checks.ts';
import { rupturesUsedAt } from '../helpers/reference-hazard/reference-screening.ts';
import { faultLonLat, zoneLonLat } from './geometry/km-fixtures.ts';

/*
 * A small invented study in open ocean (test data, not check values): one vertical strike-slip
 * fault (M 6.5 only, 0.01 a year) along the meridian 150.0° W from 47.1° S to 46.9° S, one
 * crustal zone (Gutenberg–Richter, b = 1, M 5–6.5, 0.05 a year of M >= 5, depth 8 km) just west
 * of it, both with Cornell et al. (1979); community "inside" sits in the zone 0.2° west of the
 * fault, community "far" 4.5° east of it, beyond the 300 km cut-off.
 */
const fault: FaultSource = faultLonLat(
  [
    [-150, -47.1],
    [-150, -46.9],
  ],
  {
    recurrence: { type: 'fixed', magnitude: 6.5, rate: 0.01 },
    dipDeg: 90,
    dipDirectionDeg: 90,
    upperDepthKm: 0,
    lowerDepthKm: 12,
  },
);
const zone: ZoneSource = zoneLonLat(
  [boxRing(-150.3, -47.1, -150.1, -46.9)],
  { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 6.5, rate: 0.05 },
  8,
);
const community = (id: string, lon: number): Community => ({
  id,
  name: id,
  lon,
  lat: -47,
  vs30: 760,
  vs30Basis: 'measured',
  coastal: false,
});

const study: Study = {
  name: 'Two-source test',
  communities: [community('inside', -150.2), community('far', -145.5)],
  sources: [fault, zone],
  groundMotion: { crustal: [{ model: 'Cornell79', weight: 1 }], interface: [], intraslab: [] },
  settings: {
    measures: ['PGA'],
    levels: { PGA: [0.001, 0.01, 0.05, 0.1, 0.2, 0.3, 0.5, 0.8, 1.2, 2] },
    horizonsYears: [50],
    returnPeriodsYears: [475, 2475],
    truncationSigma: 3,
    maxDistanceKm: 300,
    magnitudeStep: 0.1,
    ruptureSpacingKm: 5,
    zoneCellKm: 5,
  },
};

const result = screenStudy(study);
const [inside, far] = result.communities as [
  (typeof result.communities)[0],
  (typeof result.communities)[0],
];
const pga = inside.curves.PGA!;

describe('screenStudy: community inside the zone', () => {
  it('the lowest level (0.001 g) is exceeded by every earthquake: λ = 0.01 + 0.05 = 0.06 a year (hand computation)', () => {
    // Every rupture's median − 3σ is above 0.001 g here (precondition checked just below), so
    // each is counted with probability 1 and the rate is the sources' total rate.
    const { frame, ruptures } = discretiseStudy(study);
    const site = frame.toLocal([-150.2, -47]);
    for (const r of ruptures) {
      const lnMedian = cornell79LnPga(
        r.context.magnitude,
        ruptureDistances(r.surface, site).rhypoKm,
      );
      expect(lnMedian - 3 * 0.57).toBeGreaterThan(Math.log(0.001));
    }
    expectRelative(
      pga.annualRate[0]!,
      0.06,
      1e-12,
      "sum of the two sources' annual rates (fixed 0.01 + G-R rate 0.05)",
    );
  });

  it("median-only variant (truncation 0) equals Σ rates of the engine's ruptures whose Cornell (1979) median exceeds each level (checks the sum, not the discretisation)", () => {
    const stepStudy: Study = {
      ...study,
      communities: [study.communities[0]!],
      settings: { ...study.settings, truncationSigma: 0 },
    };
    const stepResult = screenStudy(stepStudy).communities[0]!;
    const { frame, ruptures: all } = discretiseStudy(stepStudy);
    const site = frame.toLocal([-150.2, -47]);
    const ruptures = rupturesUsedAt(all, site);
    const medians = ruptures.map((r) =>
      cornell79LnPga(r.context.magnitude, ruptureDistances(r.surface, site).rhypoKm),
    );
    const levels = stepStudy.settings.levels.PGA!;
    levels.forEach((x, j) => {
      const expected = ruptures.reduce(
        (sum, r, i) => (medians[i]! > Math.log(x) ? sum + r.annualRate : sum),
        0,
      );
      if (expected === 0) expect(stepResult.curves.PGA!.annualRate[j]).toBe(0);
      else
        expectRelative(
          stepResult.curves.PGA!.annualRate[j]!,
          expected,
          1e-12,
          `step-function hazard at ${x} g, summed over discretiseStudy's ruptures`,
        );
    });
    // Deaggregation by source at 475 years: each source's share of the rupture rates above the level.
    const d = stepResult.deaggregation['475']!;
    const above = (sourceId: string) =>
      ruptures.reduce(
        (sum, r, i) =>
          r.sourceId === sourceId && medians[i]! > Math.log(d.level) ? sum + r.annualRate : sum,
        0,
      );
    const total = above('test-fault') + above('test-zone');
    for (const s of d.bySource)
      expectRelative(
        s.share,
        above(s.sourceId) / total,
        1e-12,
        `share of ${s.sourceId}, summed over discretiseStudy's ruptures`,
      );
  });

  it('is non-increasing, with Poisson chances 1 − exp(−50 λ) (Poisson model)', () => {
    pga.annualRate.slice(1).forEach((r, i) => expect(r).toBeLessThanOrEqual(pga.annualRate[i]!));
    pga.annualRate.forEach((rate, i) =>
      expectClose(
        inside.chanceOfExceeding['50']!.PGA![i]!,
        -Math.expm1(-50 * rate),
        1e-15,
        'Poisson 1 − exp(−λt)',
      ),
    );
  });

  it('the 475- and 2475-year levels lie on the curve at rates 1/475 and 1/2475 (log–log reading)', () => {
    for (const years of [475, 2475]) {
      const level = inside.atReturnPeriod[String(years)]!.PGA!;
      expect(inside.returnPeriodStatus[String(years)]!.PGA).toBe('ok');
      const j = pga.levels.findIndex((x) => x > level);
      const [x0, x1, r0, r1] = [
        pga.levels[j - 1]!,
        pga.levels[j]!,
        pga.annualRate[j - 1]!,
        pga.annualRate[j]!,
      ];
      const rate = Math.exp(
        Math.log(r0) + (Math.log(level / x0) / Math.log(x1 / x0)) * Math.log(r1 / r0),
      );
      expectRelative(rate, 1 / years, 1e-9, 'log–log interpolation, hand computation');
    }
  });

  it('intensity: MMI at 475 years is Worden et al. (2012) of the 475-year PGA; band from it', () => {
    const mmi = inside.intensity.atReturnPeriod['475']!.mmi!;
    expectClose(
      mmi,
      mmiFromPga(inside.atReturnPeriod['475']!.PGA!),
      1e-12,
      'Worden 2012 of the PGA (from memory)',
    );
    expect(inside.band.mmi475).toBe(mmi);
    const expectedBand =
      mmi >= 8 ? 'refer-first' : mmi >= 7 ? 'refer-soon' : mmi >= 6 ? 'prepare' : 'inform';
    expect(inside.band.id).toBe(expectedBand);
    // Chance of reaching VI (MMI ≥ 5.5) in 50 years with the conversion's scatter (σ 0.73 MMI,
    // Worden et al. 2012, from memory), summed independently by parts: λ(y0) P(y0) + ∫ λ(y) dP(y)
    // over the computed levels, λ read log–log, P(y) = 1 − Φ((5.5 − MMI(y)) / σ).
    const chance = (y: number) => normalSurvival((5.5 - mmiFromPga(y)) / 0.73);
    const lambda = (y: number) => {
      const j = Math.max(
        1,
        pga.levels.findIndex((x) => x >= y),
      );
      const [x0, x1, r0, r1] = [
        pga.levels[j - 1]!,
        pga.levels[j]!,
        pga.annualRate[j - 1]!,
        pga.annualRate[j]!,
      ];
      return r1 > 0
        ? Math.exp(Math.log(r0) + (Math.log(y / x0) / Math.log(x1 / x0)) * Math.log(r1 / r0))
        : r0 + ((r1 - r0) * Math.log(y / x0)) / Math.log(x1 / x0);
    };
    const [lo, hi] = [pga.levels[0]!, pga.levels.at(-1)!];
    const n = 20000;
    let rate = lambda(lo) * chance(lo);
    for (let i = 0; i < n; i++) {
      const ya = lo * (hi / lo) ** (i / n),
        yb = lo * (hi / lo) ** ((i + 1) / n);
      rate += lambda(Math.sqrt(ya * yb)) * (chance(yb) - chance(ya));
    }
    expectRelative(
      inside.intensity.chanceOfReaching['50']!.VI,
      -Math.expm1(-50 * rate),
      1e-3,
      'Poisson of the curve convolved with the conversion scatter, summed by parts',
    );
    expect(inside.intensity.conversion).toEqual({
      measure: 'PGA',
      relation: 'Worden et al. (2012)',
      sigmaMmi: 0.73,
    });
  });

  it('intensity from the PGV relation when the settings ask for it, PGV computed even when not listed', () => {
    const base = allKindsStudy({ measures: ['PGA'], intensityMeasure: 'PGV' });
    const viaPgv = screenStudy({ ...base, communities: base.communities.slice(0, 1) })
      .communities[0]!;
    expect(viaPgv.intensity.conversion).toEqual({
      measure: 'PGV',
      relation: 'Worden et al. (2012)',
      sigmaMmi: 0.65,
    });
    expect(viaPgv.intensity.atReturnPeriod['475']!.fromMeasure).toBe('PGV');
    expect(Object.keys(viaPgv.curves)).toEqual(['PGA']);
  });

  it("deaggregation: shares sum to 1 within 1e-9; the fault's magnitudes are all 6.5, the zone's 5–6.5", () => {
    for (const years of ['475', '2475']) {
      const d = inside.deaggregation[years]!;
      expectSharesSumToOne(d);
      expect(d.mean.magnitude).toBeGreaterThanOrEqual(5);
      expect(d.mean.magnitude).toBeLessThanOrEqual(6.5);
      expect(d.measure).toBe('PGA');
    }
  });

  it('nearest fault: the test fault, 0.2° of longitude east: 15.19 km (Karney 2013 geodesic, geographiclib) bearing ≈ 90°', () => {
    const g = geodesic.Geodesic.WGS84.Inverse(-47, -150.2, -47, -150);
    const [nearest] = inside.nearestFaults;
    expect(inside.nearestFaults.length).toBe(1);
    expect(nearest!.sourceId).toBe('test-fault');
    // The closest point of a meridian to a point on the same parallel is a hair poleward; 0.05 km covers it and the frame's scale.
    expectClose(
      nearest!.distanceKm,
      (g.s12 as number) / 1000,
      0.05,
      'geodesic distance to the trace (geographiclib)',
    );
    expectClose(nearest!.bearingDeg, 90, 0.5, 'due east, common sense of the geometry');
  });
});

describe('screenStudy: community beyond the cut-off', () => {
  it('has a zero curve, no return-period levels, the inform band and no deaggregation', () => {
    expect(far.curves.PGA!.annualRate.every((r) => r === 0)).toBe(true);
    expect(far.atReturnPeriod['475']!.PGA).toBeNull();
    expect(far.returnPeriodStatus['475']!.PGA).toBe('below-lowest-level');
    expect(far.band).toEqual({ id: 'inform', label: 'Inform', mmi475: null });
    expect(far.deaggregation).toEqual({});
    expect(far.intensity.chanceOfReaching['50']).toEqual({ VI: 0, VII: 0, VIII: 0 });
    expect(far.warnings.filter((w) => w.startsWith('no deaggregation')).length).toBe(2);
  });
});

describe('screenStudy: run behaviour', () => {
  it('is deterministic: identical inputs give identical numbers', () => {
    expect(screenStudy(study)).toEqual(result);
  });

  it('reports progress rising to 1 and stops with Cancelled when asked', () => {
    const shares: number[] = [];
    screenStudy(study, { onProgress: (s) => shares.push(s) });
    expect(shares.length).toBe(2);
    expect(shares).toEqual([...shares].sort((a, b) => a - b));
    expect(shares[shares.length - 1]).toBe(1);
    let calls = 0;
    expect(() => screenStudy(study, { shouldStop: () => ++calls > 2 })).toThrow(Cancelled);
  });

  it('carries the study name and per-branch curves labelled by setting', () => {
    expect(result.studyName).toBe('Two-source test');
    expect(pga.branches!.map((b) => [b.label, b.weight])).toEqual([['crustal=Cornell79', 1]]);
  });
});

describe('screenStudy: PGV from SA(0.5 s) for a model without PGV (AGA16)', () => {
  // An invented interface fault dipping 15° under the community, AGA16 (no PGV equation).
  const interfaceFault: FaultSource = {
    ...fault,
    id: 'test-interface',
    name: 'Test interface',
    setting: 'interface',
    mechanism: 'reverse',
    rakeDeg: 90,
    recurrence: { type: 'fixed', magnitude: 8, rate: 0.002 },
    trace: [
      [-149.9, -47.3],
      [-149.9, -46.7],
    ],
    dipDeg: 15,
    dipDirectionDeg: 270,
    upperDepthKm: 5,
    lowerDepthKm: 40,
  };
  const gPerPgv = 980.665 / 20;
  const saLevels = [0.01, 0.05, 0.1, 0.3, 0.6, 1, 2, 3];
  const pgvStudy: Study = {
    ...study,
    communities: [study.communities[0]!],
    sources: [interfaceFault],
    groundMotion: { crustal: [], interface: [{ model: 'AGA16', weight: 1 }], intraslab: [] },
    settings: {
      ...study.settings,
      measures: ['SA(0.5)', 'PGV'],
      levels: { 'SA(0.5)': saLevels, PGV: saLevels.map((x) => x * gPerPgv) },
    },
  };
  const out = screenStudy(pgvStudy);

  it('warns once, at study level, naming Bommer & Alarcón (2006)', () => {
    expect(out.warnings.filter((w) => w.includes('Bommer & Alarcón 2006')).length).toBe(1);
  });

  it('PGV hazard at SA levels × 980.665/20 equals the SA(0.5) hazard (PGV = SA(0.5)/20, sigma kept; from memory)', () => {
    const c = out.communities[0]!;
    const sa = c.curves['SA(0.5)']!.annualRate;
    const pgv = c.curves.PGV!.annualRate;
    expect(sa[0]).toBeGreaterThan(0);
    sa.forEach((rate, i) =>
      expectRelative(pgv[i]!, rate, 1e-12, `Bommer & Alarcón (2006) scaling at level ${i}`),
    );
  });

  it('reads intensity from PGA, computed though not a listed measure', () => {
    const c = out.communities[0]!;
    expect(Object.keys(c.curves)).toEqual(['SA(0.5)', 'PGV']);
    expect(c.intensity.atReturnPeriod['475']!.fromMeasure).toBe('PGA');
  });

  it('one source of 0.002 a year cannot reach the 475-year rate (1/475 > 0.002): no level, no deaggregation', () => {
    const c = out.communities[0]!;
    expect(c.returnPeriodStatus['475']).toEqual({
      'SA(0.5)': 'below-lowest-level',
      PGV: 'below-lowest-level',
    });
    expect(c.deaggregation['475']).toBeUndefined();
    expect(c.warnings).toContain(
      'no deaggregation at 475 years: the 475-year SA(0.5) is below the lowest computed level',
    );
  });

  it('deaggregates the first measure at 2475 years: one source, every rupture M 8, so mean and mode M are 8', () => {
    const d = out.communities[0]!.deaggregation['2475']!;
    expect(d.measure).toBe('SA(0.5)');
    expect(d.bySource).toEqual([{ sourceId: 'test-interface', name: 'Test interface', share: 1 }]);
    expectClose(d.mean.magnitude, 8, 1e-12, 'a single fixed magnitude');
    expectClose(d.mode.magnitude, 8, 1e-12, 'a single fixed magnitude');
  });
});

describe('screenStudy: bad branches', () => {
  /** The study with these crustal branches and none for the other settings. */
  const withCrustalBranches = (crustal: Study['groundMotion']['crustal']): Study => ({
    ...study,
    groundMotion: { crustal, interface: [], intraslab: [] },
  });

  it('refuses a setting with sources but no branches, naming the field', () => {
    const bad = withCrustalBranches([]);
    expect(() => screenStudy(bad)).toThrow(InvalidInput);
    expect(() => screenStudy(bad)).toThrow(/groundMotion\.crustal/);
  });
  it('refuses weights that do not sum to 1, and unknown models', () => {
    const weights = withCrustalBranches([{ model: 'Cornell79', weight: 0.5 }]);
    expect(() => screenStudy(weights)).toThrow(/summing to 1, got 0.5/);
    const unknown = withCrustalBranches([{ model: 'NoSuchModel', weight: 1 }]);
    expect(() => screenStudy(unknown)).toThrow(UnknownModel);
  });
});
