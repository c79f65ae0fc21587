import { describe, expect, it } from 'vitest';
import { UnsupportedMeasure, UnsupportedPeriod } from '../../../api/engine/errors.ts';
import type { GmmInput } from '../../../api/engine/motion/types.ts';
import { zhao06, zhao06Msq, zhao06SiteClass } from '../../../api/engine/motion/zhao06.ts';
import { checkPreparedMeasures, checkPreparedModel } from './prepared-checks.ts';
import { sa } from './measures.ts';

const slab: GmmInput = {
  magnitude: 7,
  rakeDeg: -90,
  mechanism: 'normal',
  setting: 'intraslab',
  dipDeg: 60,
  ztorKm: 50,
  widthKm: 20,
  hypoDepthKm: 60,
  rjbKm: 30,
  rrupKm: 67,
  rxKm: 0,
  ry0Km: 0,
  rhypoKm: 67,
  repiKm: 30,
  vs30: 400,
  vs30Measured: true,
};

describe('Zhao06: site classes and validity', () => {
  it("classes Vs30 by the paper's site classes, each including its upper bound (Zhao et al. 2006)", () => {
    expect([1101, 1100, 601, 600, 301, 300, 201, 200, 150].map(zhao06SiteClass)).toEqual([
      'hard rock',
      'SC I',
      'SC I',
      'SC II',
      'SC II',
      'SC III',
      'SC III',
      'SC IV',
      'SC IV',
    ]);
  });

  it('answers outside its validity with finite numbers and applicable false; refuses PGV and periods off its table', () => {
    for (const over of [{ magnitude: 9.1 }, { rrupKm: 350 }, { hypoDepthKm: 140 }]) {
      const p = zhao06.predict({ ...slab, ...over }, { kind: 'PGA' });
      expect(p.applicable, JSON.stringify(over)).toBe(false);
      expect(Number.isFinite(p.lnMedian)).toBe(true);
    }
    expect(zhao06.predict(slab, sa(1)).applicable).toBe(true);
    expect(() => zhao06.predict(slab, { kind: 'PGV' })).toThrow(UnsupportedMeasure);
    expect(() => zhao06.predict(slab, sa(8))).toThrow(UnsupportedPeriod);
  });
});

describe('Zhao06 fast path', () => {
  it("gives predict()'s ln median, σ and applicability within 1e-12, with and without the magnitude-squared term", () => {
    for (const model of [zhao06, zhao06Msq])
      checkPreparedModel(
        model,
        [{ kind: 'PGA' }, sa(0.2), sa(1), sa(0.35)],
        ['interface', 'intraslab', 'crustal'],
        60,
      );
  });

  it("prepared for several measures gives each measure's own numbers", () => {
    checkPreparedMeasures(
      zhao06,
      [{ kind: 'PGA' }, sa(0.2), sa(1), sa(0.35)],
      ['interface', 'intraslab', 'crustal'],
      30,
    );
  });
});
