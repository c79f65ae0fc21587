import { describe, expect, it } from 'vitest';
import {
  CY14_COLUMNS,
  CY14_TABLE,
  type Cy14Row,
} from '../../../api/engine/motion/cy14-coefficients.ts';
import {
  cy14,
  cy14DefaultZ1Km,
  cy14ExpectedZtorKm,
  cy14MechanismFromRake,
  cy14RuptureTerms,
  cy14SiteSlope,
  cy14SiteTerm,
} from '../../../api/engine/motion/cy14.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import type { GmmInput } from '../../../api/engine/motion/types.ts';
import { expectClose } from '../../helpers/close.ts';
import {
  expectFallsWithDistanceRisesWithMagnitude,
  expectHangingWallAboveFootwall,
  itInterpolatesInLnPeriod,
  expectNotApplicable,
  itRefusesByName,
  RRUP_REFUSALS,
} from './model-checks.ts';
import { verticalStrikeSlip } from './crustal-input.ts';
import {
  itClassesRakesAsTheVectors,
  itMatchesVectorFile,
  itMatchesWithZ1Given,
  readVectors,
} from './reference-vectors.ts';
import { PGA, PGV, sa } from './measures.ts';
import { itIsInTheRegistry } from './registry-checks.ts';

/**
 * The reference: vectors/cy14.json, copied from ../shared/reference/gmm/vectors/cy14.json
 * (provenance in reference-vectors.ts and ../shared/reference/gmm/README.md, section
 * "CY14"): Chiou & Youngs (2014), Earthquake Spectra 30(3) 1117–1153, evaluated by an independent
 * implementation (its `generatedBy` field) for California/global (γ = 1), directivity off
 * (ΔDPP = 0), Z1 at the paper's default (ΔZ1 = 0), Vs30 measured or inferred per case, F_HW = 1
 * for Rx ≥ 0, the paper's rake classes; τ = (1 + NL0) τ(M) and φ = σ_NL0, the two parts of the
 * paper's σ.
 */
const VECTORS = readVectors('cy14.json');
const SOURCE = 'Chiou & Youngs (2014), reference vectors cy14.json';

const input = (over: Partial<GmmInput> = {}): GmmInput => verticalStrikeSlip(over);
const lnY = (over: Partial<GmmInput>, m: Measure): number => cy14.predict(input(over), m).lnMedian;

describe('CY14: the reference vectors', () => {
  // Both Vs30 kinds occur, so σ_NL0's measured (0.7) and inferred (σ3) factors are both checked.
  itMatchesVectorFile(cy14, VECTORS, SOURCE, 264);
  itMatchesWithZ1Given(cy14, VECTORS, SOURCE, cy14DefaultZ1Km);
  itClassesRakesAsTheVectors(VECTORS, cy14MechanismFromRake);
});

describe('CY14: the coefficient table', () => {
  it('has the PGA row equal to the 0.01 s row, as published', () => {
    const first = CY14_TABLE.sa[0] as Cy14Row;
    for (const column of CY14_COLUMNS) expect(CY14_TABLE.pga[column], column).toBe(first[column]);
  });
});

describe('CY14: the equation by hand', () => {
  it("takes the paper's expected Ztor for the mechanism", () => {
    // Chiou & Youngs (2014): E[Ztor] = max(2.704 − 1.226 max(M − 5.849, 0), 0)² reverse,
    // max(2.673 − 1.136 max(M − 4.970, 0), 0)² otherwise (km); values by hand.
    expectClose(
      cy14ExpectedZtorKm(6, 'reverse'),
      6.344726,
      1e-6,
      'CY14 E[Ztor] reverse M 6, by hand',
    );
    expectClose(
      cy14ExpectedZtorKm(6, 'strike-slip'),
      2.258769,
      1e-6,
      'CY14 E[Ztor] strike-slip M 6, by hand',
    );
    expectClose(
      cy14ExpectedZtorKm(8, 'reverse'),
      0.004472,
      1e-6,
      'CY14 E[Ztor] reverse M 8, by hand',
    );
    expectClose(
      cy14ExpectedZtorKm(4.5, 'normal'),
      7.144929,
      1e-6,
      'CY14 E[Ztor] normal M 4.5, by hand',
    );
    expect(cy14ExpectedZtorKm(9, 'strike-slip')).toBe(0);
  });

  it("has no site term at and above the reference Vs30 of 1130 m/s, and the table's σ there", () => {
    expectClose(
      cy14SiteTerm(CY14_TABLE.pga, 1130, 0.3, undefined),
      0,
      0,
      'CY14 site term at 1130 m/s',
    );
    expectClose(
      cy14SiteTerm(CY14_TABLE.pga, 1500, 0.3, undefined),
      0,
      0,
      'CY14 site term above 1130 m/s',
    );
    expectClose(cy14SiteSlope(CY14_TABLE.pga, 1500, 0.3), 0, 0, 'CY14 NL0 above 1130 m/s');
    expect(lnY({ vs30: 1500 }, PGA)).toBe(lnY({ vs30: 1130 }, PGA));
    // M 5 is the small-event end of the ramp: τ = τ1 = 0.4, φ = σ1 √(0.7 + 1) = 0.4912 · √1.7 (measured Vs30).
    const p = cy14.predict(input({ magnitude: 5, vs30: 1200 }), PGA);
    expectClose(p.tau, 0.4, 1e-12, 'CY14 τ1 of PGA, by hand');
    expectClose(p.phi, 0.640446444, 1e-9, 'CY14 σ_NL0 of PGA at M 5, measured, by hand');
    expectClose(
      cy14.predict(input({ magnitude: 5, vs30: 1200, vs30Measured: false }), PGA).phi,
      0.659013954,
      1e-9,
      'CY14 σ_NL0, inferred (σ3 0.8), by hand',
    );
  });

  it('has no basin term at the default Z1 and deepens long periods in a deeper basin', () => {
    const row = CY14_TABLE.sa.find((r) => r.periodS === 3) as Cy14Row;
    const at = cy14SiteTerm(row, 400, 0.05, undefined);
    expectClose(
      cy14SiteTerm(row, 400, 0.05, cy14DefaultZ1Km(400)),
      at,
      1e-12,
      'CY14 ΔZ1 = 0 at the default',
    );
    // φ5 (1 − e^(−ΔZ1/φ6)) with ΔZ1 = 500 m − μZ1, by hand from the formula.
    const deltaZ1M = 500 - cy14DefaultZ1Km(400) * 1000;
    expectClose(
      cy14SiteTerm(row, 400, 0.05, 0.5) - at,
      row.phi5 * (1 - Math.exp(-deltaZ1M / row.phi6)),
      1e-12,
      'CY14 basin term, by hand',
    );
    expect(lnY({ vs30: 400, z1Km: 0.8 }, sa(3))).toBeGreaterThan(lnY({ vs30: 400 }, sa(3)));
  });

  it('keeps the rupture terms and the pair terms apart', () => {
    const terms = cy14RuptureTerms(CY14_TABLE.pga, {
      magnitude: 6.5,
      mechanism: 'reverse',
      dipDeg: 60,
      ztorKm: 2,
    });
    expect(terms.row).toBe(CY14_TABLE.pga);
    expectClose(terms.hangingWall, CY14_TABLE.pga.c9 * 0.5, 1e-12, 'c9 cos δ at 60°');
    expectClose(terms.tau, CY14_TABLE.pga.tau2, 1e-12, 'CY14 τ at the large-event end (M ≥ 6.5)');
  });
});

describe('CY14: properties', () => {
  const measures = [PGA, PGV, sa(0.2), sa(1), sa(3)];

  it('falls with distance and rises with magnitude', () => {
    expectFallsWithDistanceRisesWithMagnitude(lnY, {
      magnitude: [3.5, 8.4],
      vs30: [200, 400, 760],
      seed: 20140802,
    });
  });

  it('is higher on the hanging wall of a dipping reverse fault than on the footwall', () => {
    expectHangingWallAboveFootwall(lnY, [PGA, PGV, sa(0.2), sa(1), sa(3)]);
  });

  itInterpolatesInLnPeriod((periodS) => cy14.predict(input(), sa(periodS)), [0.5, 0.6, 0.75], 1);

  it('answers at zero distance with finite numbers', () => {
    for (const m of measures) {
      const p = cy14.predict(input({ rrupKm: 0, rjbKm: 0, rxKm: 0, dipDeg: 45 }), m);
      for (const v of [p.lnMedian, p.sigma, p.tau, p.phi]) expect(Number.isFinite(v)).toBe(true);
    }
  });

  it('answers outside its validity with applicable false and finite numbers', () => {
    const outside: Partial<GmmInput>[] = [
      { magnitude: 9 },
      { magnitude: 3 },
      { magnitude: 8.2, rakeDeg: 90, dipDeg: 45 },
      { magnitude: 8.2, rakeDeg: -90, dipDeg: 60 },
      { rrupKm: 350 },
      { vs30: 150 },
      { vs30: 1800 },
      { ztorKm: 22 },
      { setting: 'intraslab' },
    ];
    expectNotApplicable((over, m) => cy14.predict(input(over), m), outside, measures);
    expect(cy14.predict(input({ magnitude: 8.2 }), PGA).applicable).toBe(true);
  });

  itRefusesByName((over, m) => cy14.predict(input(over), m), {
    ...RRUP_REFUSALS,
    inputs: [...RRUP_REFUSALS.inputs, [{ ztorKm: Number.NaN }, /ztorKm/], [{ z1Km: -1 }, /z1Km/]],
  });

  itIsInTheRegistry(cy14, {
    name: 'CY14',
    distanceMetric: 'rrup',
    settings: ['crustal'],
  });
});
