import { describe, expect, it } from 'vitest';
import { UnsupportedMeasure } from '../../../api/engine/errors.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { withPgvFromSa } from '../../../api/engine/motion/pgv-from-sa.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
} from '../../../api/engine/motion/types.ts';
import { pointRupture, ROCK_SITE } from '../hazard/point-ruptures.ts';
import { expectClose } from '../../helpers/close.ts';

// A hand-made model for the wrapper's arithmetic: SA(T) = 0.3 g for every T, σ = 0.7 (test scaffolding).
const flatSa: GroundMotionModel = {
  name: 'FlatSa',
  citation: 'test model',
  settings: ['interface'],
  distanceMetric: 'rrup',
  periodsS: [0.1, 1, 3],
  hasPga: true,
  hasPgv: false,
  validity: { magnitude: [5, 9], distanceKm: [0, 300], vs30: [150, 1500] },
  predict(_input: GmmInput, measure: Measure): GmmPrediction {
    if (measure.kind === 'PGV') throw new UnsupportedMeasure('PGV', 'no PGV');
    return {
      lnMedian: Math.log(0.3),
      sigma: 0.7,
      tau: 0.4,
      phi: 0.5745,
      applicable: true,
      notes: [],
    };
  },
};

const { rupture, distances } = pointRupture({ magnitude: 7, annualRate: 1, repiKm: 40 });
const input = { ...rupture.context, ...distances, ...ROCK_SITE };

describe('PGV from SA(0.5 s) (Bommer & Alarcón 2006, PGV = SA(0.5) / 20 in cm/s and cm/s², from memory)', () => {
  it('SA(0.5) = 0.3 g is 294.1995 cm/s², so PGV = 14.709975 cm/s (hand arithmetic with g = 980.665 cm/s²)', () => {
    const p = withPgvFromSa(flatSa).predict(input, { kind: 'PGV' });
    expectClose(
      Math.exp(p.lnMedian),
      14.709975,
      1e-9,
      'Bommer & Alarcón (2006) (from memory), hand arithmetic',
    );
    expect([p.sigma, p.tau, p.phi]).toEqual([0.7, 0.4, 0.5745]);
  });

  it('passes other measures through unchanged and leaves a model with PGV as it is', () => {
    const wrapped = withPgvFromSa(flatSa);
    expect(wrapped.hasPgv).toBe(true);
    expect(wrapped.predict(input, { kind: 'PGA' })).toEqual(flatSa.predict(input, { kind: 'PGA' }));
    const withPgv = { ...flatSa, hasPgv: true };
    expect(withPgvFromSa(withPgv)).toBe(withPgv);
  });

  it('refuses a model with neither PGV nor SA(0.5 s)', () => {
    expect(() => withPgvFromSa(cornell79)).toThrow(UnsupportedMeasure);
  });
});
