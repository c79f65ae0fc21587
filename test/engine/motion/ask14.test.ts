import { describe, expect, it } from 'vitest';
import {
  ASK14_CONSTANTS,
  ASK14_TABLE,
  type Ask14Row,
} from '../../../api/engine/motion/ask14-coefficients.ts';
import {
  ask14,
  ask14BasinTerm,
  ask14DefaultZ1Km,
  ask14HangingWallScale,
  ask14HangingWallTaper,
  ask14MechanismFromRake,
  ask14RuptureTerms,
  ask14V1,
} from '../../../api/engine/motion/ask14.ts';
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
  HANGING_WALL_CASE,
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
 * The reference: vectors/ask14.json, copied from ../shared/reference/gmm/vectors/ask14.json
 * (provenance in reference-vectors.ts and ../shared/reference/gmm/README.md, section
 * "ASK14"): Abrahamson, Silva & Kamai (2014), Earthquake Spectra 30(3) 1025–1055, evaluated by an
 * independent implementation (its `generatedBy` field) for the California/global region, no
 * aftershock term, Z1 at the paper's default Z1ref(Vs30), Vs30 measured or estimated per case,
 * Sa1180 at Vs30 = 1180 m/s. PGV below 330 or above 862 m/s and SA(3) above 800 m/s are left out
 * of the file (V1 not settled there).
 */
const VECTORS = readVectors('ask14.json');
const SOURCE = 'Abrahamson, Silva & Kamai (2014), reference vectors ask14.json';

const input = (over: Partial<GmmInput> = {}): GmmInput => verticalStrikeSlip(over);
const lnY = (over: Partial<GmmInput>, m: Measure): number => ask14.predict(input(over), m).lnMedian;

describe('ASK14: the reference vectors', () => {
  // Both Vs30 kinds occur, so φ's measured and estimated coefficients are both checked.
  itMatchesVectorFile(ask14, VECTORS, SOURCE, 245);
  itMatchesWithZ1Given(ask14, VECTORS, SOURCE, ask14DefaultZ1Km);
  itClassesRakesAsTheVectors(VECTORS, ask14MechanismFromRake);
});

describe('ASK14: the coefficient table', () => {
  it('has finite period-independent constants', () => {
    for (const value of Object.values(ASK14_CONSTANTS)) expect(Number.isFinite(value)).toBe(true);
  });

  it("meets the hanging-wall taper's continuity at Rx = R1 (h1 + h2 + h3 = 1)", () => {
    // Abrahamson, Silva & Kamai (2014): T3 = h1 + h2 (Rx/R1) + h3 (Rx/R1)² must reach 1 at R1, where the linear taper starts.
    expectClose(
      ASK14_CONSTANTS.h1 + ASK14_CONSTANTS.h2 + ASK14_CONSTANTS.h3,
      1,
      1e-12,
      'ASK14 hanging-wall constants',
    );
  });
});

describe('ASK14: the equation by hand', () => {
  // Terms worked by hand from the paper's equations: 1e-12 covers rounding only.
  const expectByHand = (actual: number, expected: number, what: string): void =>
    expectClose(actual, expected, 1e-12, what);

  it('tapers the hanging-wall term as the paper gives it', () => {
    // T1 (δ 45°) = 1; T2 (M 6) = 1 + 0.2(−0.5) − 0.8(0.25) = 0.7; T4 (Ztor 2 km) = 0.96: 0.672.
    expectByHand(
      ask14HangingWallScale(6, 45, 2),
      0.672,
      'Abrahamson, Silva & Kamai (2014) T1 T2 T4, by hand',
    );
    expect(ask14HangingWallScale(5.5, 45, 2)).toBe(0);
    expect(ask14HangingWallScale(7, 45, 10)).toBe(0);
    // R1 10 km: T3 at Rx 5 = 0.25 + 0.75 − 0.1875 = 0.8125; at Rx 20 (R2 30) = 0.5; T5 fades 5 km beyond Ry1 = Rx tan 20°.
    expectByHand(ask14HangingWallTaper(10, 5, 0), 0.8125, 'ASK14 T3 below R1, by hand');
    expectByHand(ask14HangingWallTaper(10, 20, 0), 0.5, 'ASK14 T3 between R1 and R2, by hand');
    expect(ask14HangingWallTaper(10, 30, 0)).toBe(0);
    const ry1 = 5 * Math.tan((20 * Math.PI) / 180);
    expectByHand(
      ask14HangingWallTaper(10, 5, ry1 + 2.5),
      0.8125 * 0.5,
      'ASK14 T5 halfway, by hand',
    );
    expect(ask14HangingWallTaper(10, 5, ry1 + 5)).toBe(0);
    expect(ask14HangingWallTaper(0, 0, 0)).toBe(0);
  });

  it("stops Vs30 scaling at the paper's V1", () => {
    expect(ask14V1(0)).toBe(1500);
    expect(ask14V1(0.5)).toBe(1500);
    expectClose(
      ask14V1(1),
      1500 * 2 ** -0.35,
      1e-9,
      'ASK14 V1 = exp(−0.35 ln(T/0.5) + ln 1500), by hand',
    );
    expect(ask14V1(3)).toBe(800);
    expect(ask14V1(10)).toBe(800);
    expect(lnY({ vs30: 1600 }, PGA)).toBe(lnY({ vs30: 1500 }, PGA));
  });

  it("has no basin term at the default Z1 and the paper's f10 elsewhere", () => {
    const row = ASK14_TABLE.sa.find((r) => r.periodS === 3) as Ask14Row;
    expect(ask14BasinTerm(row, 400, undefined)).toBe(0);
    expectClose(ask14BasinTerm(row, 400, ask14DefaultZ1Km(400)), 0, 1e-15, 'ASK14 f10 at Z1ref');
    // Vs30 400 m/s uses a45: f10 = a45 ln((0.5 + 0.01)/(Z1ref + 0.01)).
    expectClose(
      ask14BasinTerm(row, 400, 0.5),
      row.a45 * Math.log(0.51 / (ask14DefaultZ1Km(400) + 0.01)),
      1e-15,
      'ASK14 f10, by hand',
    );
    expect(lnY({ vs30: 400, z1Km: 0.8 }, sa(3))).toBeGreaterThan(lnY({ vs30: 400 }, sa(3)));
  });

  it('keeps the rupture terms and the pair terms apart', () => {
    const terms = ask14RuptureTerms(ASK14_TABLE.pga, {
      magnitude: 6.5,
      mechanism: 'reverse',
      dipDeg: 45,
      ztorKm: 2,
      widthKm: 14,
    });
    expect(terms.row).toBe(ASK14_TABLE.pga);
    expectClose(terms.r1Km, 14 * Math.SQRT1_2, 1e-12, 'R1 = W cos δ');
    // M 6.5: τA halfway between s3 and s4 (M 5 to 7 ramp); φA at s2 (M ≥ 6).
    expectClose(
      terms.tauA,
      ASK14_TABLE.pga.s3 + 0.75 * (ASK14_TABLE.pga.s4 - ASK14_TABLE.pga.s3),
      1e-12,
      'ASK14 τA ramp',
    );
    expectClose(terms.phiAMeasured, ASK14_TABLE.pga.s2Meas, 1e-12, 'ASK14 φA above M 6');
  });
});

describe('ASK14: properties', () => {
  const measures = [PGA, PGV, sa(0.2), sa(1), sa(3)];

  it('falls with distance and rises with magnitude', () => {
    expectFallsWithDistanceRisesWithMagnitude(lnY, {
      magnitude: [3, 8.4],
      vs30: [200, 400, 760],
      seed: 20140801,
    });
  });

  it('is higher on the hanging wall of a dipping reverse fault than on the footwall', () => {
    expectHangingWallAboveFootwall(lnY, [PGA, PGV, sa(0.2), sa(1), sa(3)]);
    const hanging = input(HANGING_WALL_CASE.hanging);
    // a13 is 0 from 5 s: no hanging-wall effect there.
    expect(ask14.predict(hanging, sa(5)).lnMedian).toBe(
      ask14.predict({ ...hanging, rxKm: -10 }, sa(5)).lnMedian,
    );
  });

  it("gives a larger φ where Vs30 is estimated than where it is measured (the paper's s1, s2)", () => {
    const measured = ask14.predict(input({ magnitude: 4.5 }), PGA);
    const estimated = ask14.predict(input({ magnitude: 4.5, vs30Measured: false }), PGA);
    expect(estimated.lnMedian).toBe(measured.lnMedian);
    expect(estimated.phi).toBeGreaterThan(measured.phi);
  });

  itInterpolatesInLnPeriod((periodS) => ask14.predict(input(), sa(periodS)), [0.5, 0.6, 0.75], 1);

  it('answers at zero distance and zero width with finite numbers', () => {
    for (const m of measures) {
      for (const p of [
        ask14.predict(input({ rrupKm: 0, rjbKm: 0, rxKm: 0 }), m),
        ask14.predict(input({ widthKm: 0, dipDeg: 45, rxKm: 0 }), m),
      ]) {
        for (const v of [p.lnMedian, p.sigma, p.tau, p.phi]) expect(Number.isFinite(v)).toBe(true);
      }
    }
  });

  it('answers outside its validity with applicable false and finite numbers', () => {
    const outside: Partial<GmmInput>[] = [
      { magnitude: 9 },
      { magnitude: 2.5 },
      { rrupKm: 350 },
      { vs30: 150 },
      { vs30: 1200 },
      { setting: 'interface' },
    ];
    expectNotApplicable((over, m) => ask14.predict(input(over), m), outside, measures);
    expect(ask14.predict(input({ magnitude: 8.5, vs30: 180 }), PGA).applicable).toBe(true);
  });

  itRefusesByName((over, m) => ask14.predict(input(over), m), {
    ...RRUP_REFUSALS,
    inputs: [...RRUP_REFUSALS.inputs, [{ ry0Km: Number.NaN }, /ry0Km/], [{ z1Km: -1 }, /z1Km/]],
  });

  itIsInTheRegistry(ask14, {
    name: 'ASK14',
    distanceMetric: 'rrup',
    settings: ['crustal'],
  });
});
