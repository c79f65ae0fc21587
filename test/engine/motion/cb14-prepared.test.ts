import { describe, expect, it } from 'vitest';
import { InvalidInput, UnsupportedPeriod } from '../../../api/engine/errors.ts';
import { cb14 } from '../../../api/engine/motion/cb14.ts';
import {
  checkPreparedAcrossSites,
  checkPreparedMeasures,
  checkPreparedModel,
  checkSiteOrder,
} from './prepared-checks.ts';
import { sa } from './measures.ts';

// The hook's numbers against predict() (cb14.ts); predict() itself is checked against the paper in cb14.test.ts.

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
    checkPreparedAcrossSites(cb14, [{ kind: 'PGA' }, sa(0.1), sa(1)], 'crustal');
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

  it('gives each site the same numbers whatever site came before (site parts kept per row are renewed when Vs30 or Z2.5 changes)', () => {
    // Below and above k1 (nonlinear site term and σ, linear), Z2.5 given, default and in each basin branch.
    checkSiteOrder(cb14, [
      { vs30: 250, vs30Measured: true },
      { vs30: 760, vs30Measured: true },
      { vs30: 250, vs30Measured: true, z2p5Km: 0.5 },
      { vs30: 250, vs30Measured: true, z2p5Km: 5 },
      { vs30: 1300, vs30Measured: false, z2p5Km: 2 },
    ]);
  });
});
