import { describe, expect, it } from 'vitest';
import { UnknownModel, UnsupportedMeasure } from '../../../api/engine/errors.ts';
import { createModelCatalog } from '../../../api/engine/motion/catalog.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import { probeMotion } from '../../../api/engine/motion/probe.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

const models = createModelCatalog([cornell79], {
  crustal: [{ model: 'Cornell79', weight: 1 }],
  interface: [],
  intraslab: [],
});

describe('probeMotion', () => {
  it('evaluates Cornell et al. (1979) with the stated default hypocentral distance', () => {
    const result = probeMotion({ model: 'Cornell79', magnitude: 6.5, rjbKm: 20 }, models);
    // Defaults: hypocentral depth 10 km, so Rhypo = sqrt(20² + 10²) km.
    const r = Math.hypot(20, 10);
    // Baker (2008) quotes Cornell et al. (1979): mean ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25), σ = 0.57.
    expectRelative(
      result.measures.PGA!.median,
      Math.exp(-0.152 + 0.859 * 6.5 - 1.803 * Math.log(r + 25)),
      1e-12,
      'Cornell et al. (1979)',
    );
    expectClose(result.measures.PGA!.sigma, 0.57, 0, 'Cornell et al. (1979) σ');
    expect(Object.keys(result.measures)).toEqual(['PGA']);
    expect(result.defaults).toContain('rhypoKm = sqrt(rjb² + hypoDepth²)');
    expect(result.input.rxKm).toBe(-20);
  });

  it('refuses an unknown model and a measure the model lacks', () => {
    expect(() => probeMotion({ model: 'NOPE', magnitude: 6, rjbKm: 10 }, models)).toThrow(
      UnknownModel,
    );
    expect(() =>
      probeMotion({ model: 'Cornell79', magnitude: 6, rjbKm: 10, measures: ['SA(1.0)'] }, models),
    ).toThrow(UnsupportedMeasure);
  });
});
