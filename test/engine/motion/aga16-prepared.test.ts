import { describe, expect, it } from 'vitest';
import { UnsupportedMeasure } from '../../../api/engine/errors.ts';
import { aga16 } from '../../../api/engine/motion/aga16.ts';
import { withPgvFromSa } from '../../../api/engine/motion/pgv-from-sa.ts';
import { checkPreparedMeasures, checkPreparedModel } from './prepared-checks.ts';
import { sa } from './measures.ts';

// The hook's numbers against predict() (aga16.ts); predict() itself is checked against the paper in aga16.test.ts.
const interfaceRupture = {
  magnitude: 8,
  rakeDeg: 90,
  mechanism: 'reverse' as const,
  setting: 'interface' as const,
  dipDeg: 14,
  ztorKm: 5,
  widthKm: 100,
  hypoDepthKm: 20,
};

describe('AGA16 precomputation hook', () => {
  it("gives predict()'s ln median, σ and applicability, within 1e-12: interface, intraslab and crustal ruptures, PGA and SA on and between rows", () => {
    checkPreparedModel(
      aga16,
      [{ kind: 'PGA' }, sa(0.2), sa(0.02), sa(1), sa(0.12), sa(7)],
      ['interface', 'intraslab', 'crustal'],
    );
  });

  it("prepared for several measures at once gives each measure's own numbers exactly (the shared rock motion and distance terms change none)", () => {
    checkPreparedMeasures(
      aga16,
      [{ kind: 'PGA' }, sa(0.2), sa(1), sa(0.12), sa(7)],
      ['interface', 'intraslab', 'crustal'],
    );
  });

  it("PGV from SA(0.5 s) prepared beside other measures gives the wrapper's own PGV (pgv-from-sa.ts)", () => {
    checkPreparedMeasures(
      withPgvFromSa(aga16),
      [{ kind: 'PGA' }, { kind: 'PGV' }, sa(1)],
      ['interface', 'intraslab'],
    );
  });

  it("PGV from SA(0.5 s) through the wrapper's hook equals the wrapper's predict() (Bommer & Alarcón 2006 scaling, pgv-from-sa.ts)", () => {
    checkPreparedModel(
      withPgvFromSa(aga16),
      [{ kind: 'PGV' }, { kind: 'PGA' }],
      ['interface', 'intraslab'],
    );
  });

  it('asks for Rrup for interface ruptures and Rhypo for intraslab ones; refuses PGV as predict does', () => {
    expect(aga16.prepare!([interfaceRupture], { kind: 'PGA' }).distances).toEqual(['rrupKm']);
    expect(
      aga16.prepare!([{ ...interfaceRupture, setting: 'intraslab' }], sa(1)).distances,
    ).toEqual(['rhypoKm']);
    expect(() => aga16.prepare!([interfaceRupture], { kind: 'PGV' })).toThrow(UnsupportedMeasure);
  });
});
