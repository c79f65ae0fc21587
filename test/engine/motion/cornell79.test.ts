import { describe, expect, it } from 'vitest';
import { UnsupportedMeasure } from '../../../api/engine/errors.ts';
import { cornell79, cornell79LnPga } from '../../../api/engine/motion/cornell79.ts';
import { pointRupture, ROCK_SITE } from '../hazard/point-ruptures.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

const inputFor = (magnitude: number, rhypoKm: number) => {
  const { rupture, distances } = pointRupture({ magnitude, annualRate: 1, repiKm: rhypoKm });
  return { ...rupture.context, ...distances, ...ROCK_SITE };
};

describe('Cornell et al. (1979) PGA model', () => {
  it('M 6.5 at R = 10 km: mean ln PGA = −0.152 + 0.859 × 6.5 − 1.803 ln 35 = −0.97879 (Baker 2008 white paper, worked example set-up, from memory; arithmetic by hand)', () => {
    // 0.859 × 6.5 = 5.5835; ln 35 = 3.5553481; 1.803 × 3.5553481 = 6.4102926; −0.152 + 5.5835 − 6.4102926 = −0.9787926
    expectClose(
      cornell79LnPga(6.5, 10),
      -0.9787926,
      1e-7,
      'Cornell et al. (1979) equation as printed in Baker (2008), hand arithmetic',
    );
    const p = cornell79.predict(inputFor(6.5, 10), { kind: 'PGA' });
    // Median exp(−0.97879) = 0.3758 g: the order of magnitude Baker's figure of this scenario shows (~0.4 g, from memory).
    expectRelative(Math.exp(p.lnMedian), 0.3757645, 1e-6, 'exp of the hand value');
    expect(p.sigma).toBe(0.57);
    expect(p.applicable).toBe(true);
  });

  it('M 7.5 at R = 30 km: mean ln PGA = −0.152 + 6.4425 − 1.803 ln 55 = −0.93472 (hand arithmetic on the printed equation)', () => {
    // ln 55 = 4.0073332; 1.803 × 4.0073332 = 7.2252217; −0.152 + 6.4425 − 7.2252217 = −0.9347217
    expectClose(
      cornell79LnPga(7.5, 30),
      -0.9347217,
      1e-7,
      'Cornell et al. (1979), hand arithmetic',
    );
  });

  it("rises with magnitude by 0.859 per unit and falls with distance (the equation's coefficients)", () => {
    expectClose(
      cornell79LnPga(7, 20) - cornell79LnPga(6, 20),
      0.859,
      1e-12,
      'magnitude coefficient 0.859',
    );
    expectClose(
      cornell79LnPga(6, 75) - cornell79LnPga(6, 25),
      -1.803 * Math.log(2),
      1e-12,
      'distance term −1.803 ln(R + 25)',
    );
  });

  it('says when an input is outside its stated range, still with finite numbers', () => {
    const p = cornell79.predict(inputFor(8.5, 250), { kind: 'PGA' });
    expect(p.applicable).toBe(false);
    expect(p.notes.length).toBe(2);
    expect(Number.isFinite(p.lnMedian)).toBe(true);
  });

  it('refuses SA and PGV with UnsupportedMeasure', () => {
    expect(() => cornell79.predict(inputFor(6, 10), { kind: 'SA', periodS: 1 })).toThrow(
      UnsupportedMeasure,
    );
    expect(() => cornell79.predict(inputFor(6, 10), { kind: 'PGV' })).toThrow(/PGA only/);
  });
});
