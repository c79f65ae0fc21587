import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { BSSA14_TABLE } from '../../../api/engine/motion/bssa14-coefficients.ts';
import {
  bssa14,
  bssa14LnMedian,
  bssa14MechanismFromRake,
  bssa14Phi,
  bssa14RuptureTerms,
  bssa14SiteTerms,
  predictBssa14,
} from '../../../api/engine/motion/bssa14.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { verticalStrikeSlip } from './crustal-input.ts';
import type { GmmInput } from '../../../api/engine/motion/types.ts';
import { expectClose } from '../../helpers/close.ts';
import {
  expectFallsWithDistanceRisesWithMagnitude,
  itMatchesFigureMedians,
  itInterpolatesInLnPeriod,
  expectNotApplicable,
  itRefusesByName,
} from './model-checks.ts';
import { expectSmoothSpectrum } from './crustal-table-checks.ts';
import { PGA, PGV, sa } from './measures.ts';

const SOURCE = 'Boore et al. (2014)';

const input = (over: Partial<GmmInput> = {}): GmmInput => verticalStrikeSlip(over);
const lnY = (over: Partial<GmmInput>, m: Measure): number =>
  bssa14.predict(input(over), m).lnMedian;

describe('BSSA14: the equation', () => {
  it('reproduces a hand calculation of PGA at M 7, Rjb 10 km, Vs30 760 m/s, strike-slip', () => {
    // Boore et al. (2014) source and path functions with the PGA row of the published table, by hand:
    // F_E = e1 + e6 (7 − 5.5) = 0.4856 − 0.1662·1.5 = 0.2363; R = √(10² + 4.5²) = 10.96586 km;
    // F_P = (c1 + c2 (7 − 4.5)) ln R + c3 (R − 1) = −0.65475·2.39480 − 0.008088·9.96586 = −1.64859;
    // F_S = 0 at Vref; ln PGA = −1.41229 (0.2436 g).
    expectClose(lnY({}, PGA), -1.41229, 1e-5, `${SOURCE}: ln PGA, hand calculation`);
  });

  it('reproduces a hand calculation of SA(1.0) below the hinge magnitude', () => {
    // 1 s row of the published table: M 5, Rjb 20 km: F_E = 0.4218 + 1.5004(−1.2) − 0.18983(1.44) = −1.65282;
    // R = √(20² + 5.74²) = 20.8074; F_P = (−1.193 + 0.10248·0.5) ln R − 0.00121 (R − 1) = −3.48877;
    // ln SA = −5.14160 (0.00585 g).
    expectClose(
      lnY({ magnitude: 5, rjbKm: 20 }, sa(1)),
      -5.1416,
      1e-4,
      `${SOURCE}: ln SA(1.0), hand calculation`,
    );
  });

  it('has a linear site term of zero at Vref = 760 m/s and a nonlinear term of zero at and above it', () => {
    // Boore et al. (2014) site function (from memory): ln F_lin = c ln(Vs30/Vref); f2 vanishes at 760 m/s.
    for (const row of [BSSA14_TABLE.pga, ...BSSA14_TABLE.sa]) {
      expectClose(
        bssa14SiteTerms(row, 760).linear,
        0,
        0,
        `${SOURCE}: ln F_lin at Vref, ${row.periodS} s`,
      );
      expectClose(bssa14SiteTerms(row, 760).f2, 0, 0, `${SOURCE}: f2 at 760 m/s, ${row.periodS} s`);
      expectClose(
        bssa14SiteTerms(row, 1200).f2,
        0,
        0,
        `${SOURCE}: f2 at 1200 m/s, ${row.periodS} s`,
      );
    }
    const rupture = bssa14RuptureTerms(BSSA14_TABLE.pga, 7, 'strike-slip');
    for (const rockFactor of [0.1, 1, 3])
      expect(lnY({}, PGA)).toBe(
        bssa14LnMedian(
          BSSA14_TABLE.pga,
          rupture,
          bssa14SiteTerms(BSSA14_TABLE.pga, 760),
          10,
          rockFactor,
        ),
      );
  });

  it('caps the linear site term at Vc', () => {
    // Boore et al. (2014) site function (from memory): ln F_lin stops changing above Vc (1500 m/s for PGA).
    expect(bssa14SiteTerms(BSSA14_TABLE.pga, 1800).linear).toBe(
      bssa14SiteTerms(BSSA14_TABLE.pga, 1500).linear,
    );
    expectClose(
      bssa14SiteTerms(BSSA14_TABLE.pga, 380).linear,
      -0.6 * Math.log(0.5),
      1e-12,
      `${SOURCE}: c ln(380/760), PGA`,
    );
  });

  it('reduces soft-soil amplification under strong rock shaking (nonlinear site response)', () => {
    // Boore et al. (2014), site term after Seyhan & Stewart (2014): on Vs30 = 200 m/s the
    // amplification of PGA falls as rock PGA grows.
    const amplification = (over: Partial<GmmInput>): number =>
      lnY({ ...over, vs30: 200 }, PGA) - lnY({ ...over, vs30: 760 }, PGA);
    const weak = amplification({ magnitude: 5, rjbKm: 100 });
    const strong = amplification({ magnitude: 7.5, rjbKm: 1 });
    expect(weak).toBeGreaterThan(0);
    expect(strong).toBeLessThan(weak - 0.3);
    // f2 < 0 on soft soil: the nonlinear term falls as ln((PGAr + f3) / f3) grows.
    expect(bssa14SiteTerms(BSSA14_TABLE.pga, 200).f2).toBeLessThan(0);
  });
});

describe('BSSA14: mechanism', () => {
  it("classifies rake by the paper's ranges", () => {
    // Boore et al. (2014), mechanism classes by rake (from memory).
    expect(bssa14MechanismFromRake(0)).toBe('strike-slip');
    expect(bssa14MechanismFromRake(180)).toBe('strike-slip');
    expect(bssa14MechanismFromRake(-160)).toBe('strike-slip');
    expect(bssa14MechanismFromRake(30)).toBe('strike-slip');
    expect(bssa14MechanismFromRake(31)).toBe('reverse');
    expect(bssa14MechanismFromRake(90)).toBe('reverse');
    expect(bssa14MechanismFromRake(-90)).toBe('normal');
    expect(bssa14MechanismFromRake(270)).toBe('normal');
  });

  it('orders the mechanisms as the table does', () => {
    // Table of coefficients (published, 2014-07-15): normal (e2) lowest wherever typed; reverse (e3) above
    // strike-slip (e1) at 0.3 s, below it for PGA; unspecified (e0) between normal and the others.
    const at = (rakeDeg: number, m: Measure): number => lnY({ rakeDeg, magnitude: 6.5 }, m);
    for (const m of [PGA, PGV, sa(0.01), sa(0.05), sa(0.3), sa(1)]) {
      expect(at(-90, m), 'normal < strike-slip').toBeLessThan(at(0, m));
      expect(at(-90, m), 'normal < reverse').toBeLessThan(at(90, m));
      const unspecified = predictBssa14(input({ magnitude: 6.5 }), m, {
        mechanism: 'unspecified',
      }).lnMedian;
      expect(unspecified).toBeGreaterThan(at(-90, m));
    }
    expect(at(90, sa(0.3))).toBeGreaterThan(at(0, sa(0.3)));
    expect(at(90, PGA)).toBeLessThan(at(0, PGA));
  });
});

describe('BSSA14: standard deviations', () => {
  it('equals the table where no adjustment applies', () => {
    // Table of coefficients (published, 2014-07-15): M ≥ 5.5, Rjb ≤ R1 and Vs30 ≥ V2 give τ2 and φ2;
    // M ≤ 4.5 gives τ1 and φ1. σ = √(τ² + φ²).
    const cases: [Measure, number, number, number, number][] = [
      [PGA, 0.348, 0.495, 0.398, 0.695],
      [sa(0.2), 0.309, 0.539, 0.344, 0.711],
      [sa(1), 0.298, 0.625, 0.498, 0.553],
      [PGV, 0.346, 0.552, 0.401, 0.644],
    ];
    for (const [m, tau2, phi2, tau1, phi1] of cases) {
      const large = bssa14.predict(input({ magnitude: 6.5, rjbKm: 10, vs30: 500 }), m);
      expectClose(large.tau, tau2, 1e-12, `${SOURCE}: τ2`);
      expectClose(large.phi, phi2, 1e-12, `${SOURCE}: φ2`);
      expectClose(large.sigma, Math.hypot(tau2, phi2), 1e-12, `${SOURCE}: σ = √(τ2² + φ2²)`);
      const small = bssa14.predict(input({ magnitude: 4, rjbKm: 10, vs30: 500 }), m);
      expectClose(small.tau, tau1, 1e-12, `${SOURCE}: τ1`);
      expectClose(small.phi, phi1, 1e-12, `${SOURCE}: φ1`);
    }
    expectClose(
      bssa14.predict(input({ magnitude: 6.5 }), PGA).sigma,
      0.605086,
      1e-6,
      `${SOURCE}: σ(PGA, M ≥ 5.5) by hand`,
    );
  });

  it("ramps with magnitude, distance and Vs30 as the paper's φ(M, Rjb, Vs30) says", () => {
    // PGA row of the published table: τ at M 5 is halfway between τ1 0.398 and τ2 0.348; φ at
    // Rjb = √(R1 R2) gains half of ΔφR = 0.1; below V1 = 225 m/s φ loses ΔφV = 0.07.
    const phiAt = (magnitude: number, rjbKm: number, vs30: number): number =>
      bssa14Phi(
        BSSA14_TABLE.pga,
        bssa14RuptureTerms(BSSA14_TABLE.pga, magnitude, 'strike-slip'),
        bssa14SiteTerms(BSSA14_TABLE.pga, vs30),
        rjbKm,
      );
    expectClose(
      bssa14RuptureTerms(BSSA14_TABLE.pga, 5, 'strike-slip').tau,
      0.373,
      1e-12,
      `${SOURCE}: τ(M 5), PGA`,
    );
    expectClose(phiAt(6, Math.sqrt(110 * 270), 760), 0.545, 1e-12, `${SOURCE}: φ at √(R1 R2), PGA`);
    expectClose(phiAt(6, 350, 200), 0.495 + 0.1 - 0.07, 1e-12, `${SOURCE}: φ beyond R2, below V1`);
    const mid = Math.sqrt(225 * 300);
    expectClose(phiAt(6, 10, mid), 0.495 - 0.035, 1e-12, `${SOURCE}: φ at √(V1 V2)`);
  });
});

describe('BSSA14: medians against published figures', () => {
  itMatchesFigureMedians(lnY, 'rjbKm', 'Boore et al. (2014) / Gregor et al. (2014)');

  it('gives SA(0.01) practically equal to PGA', () => {
    // PSA at 0.01 s equals PGA to within a few percent (common practice; the paper's rows agree).
    for (const over of [
      { magnitude: 5, rjbKm: 5 },
      { magnitude: 7, rjbKm: 30, vs30: 300 },
      { magnitude: 8, rjbKm: 150 },
    ]) {
      expectClose(lnY(over, sa(0.01)), lnY(over, PGA), 0.03, 'common practice: PSA(0.01 s) ≈ PGA');
    }
  });

  it('gives smooth median spectra in ln(period)', () => {
    // A wrong coefficient shows as a kink in ln SA. M 3.5–8, Rjb 0–150 km, Vs30 180–760 m/s,
    // every mechanism: the recalled table's worst is 0.146 ln units (M 3.5, 5–7.5 s); bound 0.2.
    for (const magnitude of [3.5, 5, 6, 7, 8]) {
      for (const rjbKm of [0, 10, 50, 150]) {
        for (const vs30 of [180, 300, 760]) {
          for (const rakeDeg of [0, 90, -90]) {
            expectSmoothSpectrum(
              BSSA14_TABLE.sa.map((r) => r.periodS),
              (periodS) => lnY({ magnitude, rjbKm, vs30, rakeDeg }, sa(periodS)),
              0.2,
              `M ${magnitude}, ${rjbKm} km, ${vs30} m/s, rake ${rakeDeg}`,
            );
          }
        }
      }
    }
  });
});

describe('BSSA14: properties', () => {
  const measures = [PGA, PGV, sa(0.2), sa(1), sa(3)];

  it('falls with distance and rises with magnitude', () => {
    expectFallsWithDistanceRisesWithMagnitude(lnY, {
      magnitude: [3, 8.5],
      distance: 'rjbKm',
      distanceKm: [0, 390],
      seed: 20140301,
    });
  });

  itInterpolatesInLnPeriod(
    (periodS) => bssa14.predict(input(), sa(periodS)),
    [0.17, 0.175, 0.18],
    0.2,
  );

  it('answers outside its validity with applicable false and finite numbers', () => {
    const outside: Partial<GmmInput>[] = [
      { magnitude: 9 },
      { magnitude: 2.5 },
      { rjbKm: 450 },
      { vs30: 120 },
      { vs30: 2000 },
      { magnitude: 7.5, rakeDeg: -90 },
      { setting: 'interface' },
    ];
    expectNotApplicable((over, m) => bssa14.predict(input(over), m), outside, measures);
    expect(bssa14.predict(input({ magnitude: 7.5, rakeDeg: 0 }), PGA).applicable).toBe(true);
  });

  itRefusesByName((over, m) => bssa14.predict(input(over), m), {
    periodsS: [0.005, 12],
    inputs: [
      [{ magnitude: Number.NaN }, /magnitude/],
      [{ rjbKm: -1 }, InvalidInput],
      [{ vs30: 0 }, /vs30/],
      [{ rakeDeg: Number.POSITIVE_INFINITY }, /rakeDeg/],
    ],
  });

  it('describes itself for the registry', () => {
    expect(bssa14.name).toBe('BSSA14');
    expect(bssa14.distanceMetric).toBe('rjb');
    expect(bssa14.settings).toEqual(['crustal']);
    expect(bssa14.hasPga && bssa14.hasPgv).toBe(true);
    expect(bssa14.validity).toEqual({
      magnitude: [3, 8.5],
      distanceKm: [0, 400],
      vs30: [150, 1500],
    });
  });
});
