import { describe, expect, it } from 'vitest';
import { InvalidInput, UnsupportedPeriod } from '../../../api/engine/errors.ts';
import { cb14 } from '../../../api/engine/motion/cb14.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { createPairPredictions } from '../../../api/engine/motion/prepared-period.ts';
import type { RuptureContext } from '../../../api/engine/motion/types.ts';
import { expectClose } from '../../helpers/close.ts';
import {
  checkPreparedMeasures,
  checkPreparedModel,
  pairColumns,
  TOLERANCE,
  type PairCase,
} from './prepared-checks.ts';

// The hook's numbers against predict() (cb14.ts); predict() itself is checked against the paper in cb14.test.ts.
const sa = (periodS: number): Measure => ({ kind: 'SA', periodS });

describe('CB14 precomputation hook', () => {
  it("gives predict()'s ln median, σ and applicability, within 1e-12: PGA, PGV, SA with and without the PGA floor, between rows", () => {
    checkPreparedModel(
      cb14,
      [{ kind: 'PGA' }, { kind: 'PGV' }, sa(0.1), sa(0.12), sa(0.2), sa(1), sa(2.5)],
      ['crustal', 'crustal', 'intraslab'],
    );
  });

  it("prepared for several measures at once gives each measure's own numbers exactly (the shared rock motion and distance terms change none)", () => {
    checkPreparedMeasures(
      cb14,
      [{ kind: 'PGA' }, sa(0.2), sa(1), { kind: 'PGV' }, sa(0.1), sa(0.12), sa(2.5)],
      ['crustal', 'crustal', 'intraslab'],
    );
  });

  it("keeps giving predict()'s numbers, within 1e-12, when one prepared model meets sites of one Vs30 after another (its Vs30 terms are worked out once per Vs30)", () => {
    const rupture = (magnitude: number, ztorKm: number): RuptureContext => ({
      magnitude,
      rakeDeg: 90,
      mechanism: 'reverse',
      setting: 'crustal',
      dipDeg: 40,
      ztorKm,
      widthKm: 15,
      hypoDepthKm: ztorKm + 6,
    });
    const cases: PairCase[] = [
      [rupture(5, 2), 3, 0],
      [rupture(6.5, 0), 20, 12],
      [rupture(7.4, 4), 90, -30],
      [rupture(6.5, 0), 250, 100],
    ].map(([r, rjbKm, rxKm]) => ({
      rupture: r as RuptureContext,
      distances: {
        rjbKm: rjbKm as number,
        rrupKm: (rjbKm as number) + 2,
        rxKm: rxKm as number,
        ry0Km: 0,
        rhypoKm: (rjbKm as number) + 5,
        repiKm: rjbKm as number,
      },
    }));
    for (const measure of [{ kind: 'PGA' } as const, sa(0.1), sa(1)]) {
      const prepared = cb14.prepare!(
        cases.map((c) => c.rupture),
        measure,
      );
      // Below and above k1 (865 m/s for PGA), back again, and with a Z2.5 given.
      for (const site of [
        { vs30: 760, vs30Measured: false },
        { vs30: 760, vs30Measured: false },
        { vs30: 300, vs30Measured: true },
        { vs30: 1100, vs30Measured: false },
        { vs30: 760, vs30Measured: false, z2p5Km: 4 },
        { vs30: 180, vs30Measured: false },
      ]) {
        const out = createPairPredictions(cases.length);
        prepared.predictPairs(site, pairColumns(cases), out);
        cases.forEach((c, k) => {
          const expected = cb14.predict({ ...c.rupture, ...c.distances, ...site }, measure);
          const where = `CB14 pair ${k} at Vs30 ${site.vs30} m/s`;
          expectClose(out.lnMedian[k]!, expected.lnMedian, TOLERANCE, `${where}: ln median`);
          expectClose(out.sigma[k]!, expected.sigma, TOLERANCE, `${where}: sigma`);
        });
      }
    }
  });

  it('asks for Rrup, Rjb and Rx; refuses a bad dip and a period outside the table as predict does', () => {
    expect(cb14.prepare!([], { kind: 'PGA' }).distances).toEqual(['rrupKm', 'rjbKm', 'rxKm']);
    expect(() => cb14.prepare!([], sa(0.005))).toThrow(UnsupportedPeriod);
    const rupture = {
      magnitude: 6,
      rakeDeg: 0,
      mechanism: 'strike-slip' as const,
      setting: 'crustal' as const,
      dipDeg: 0,
      ztorKm: 0,
      widthKm: 10,
      hypoDepthKm: 8,
    };
    expect(() => cb14.prepare!([rupture], { kind: 'PGA' })).toThrow(InvalidInput);
    expect(() => cb14.prepare!([rupture], { kind: 'PGA' })).toThrow(
      /dipDeg: expected a dip above 0° and at most 90°, got 0/,
    );
  });
});
