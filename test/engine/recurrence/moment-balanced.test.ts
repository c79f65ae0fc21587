import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import type { MomentBalancedRecurrence } from '../../../api/engine/model.ts';
import { magnitudeBins } from '../../../api/engine/recurrence/magnitude-bins.ts';
import { expectRelative } from '../../helpers/close.ts';

/*
 * Moment balance: the bins (each an event of its centre magnitude, M0 by Hanks & Kanamori 1979)
 * must release μ A s = 3e10 Pa x 1500 km² x 4 mm/yr = 1.8e17 N·m/yr (arithmetic by hand).
 * The balance is over the bins, so that sum is exact to rounding (1e-9). The continuous
 * density integrated against M0 differs from it by the midpoint error of 0.1-unit bins,
 * under 0.5% (moment-balanced.ts); checked here by an independent quadrature of the
 * densities of Cosentino et al. (1977) and Youngs & Coppersmith (1985).
 */
const MOMENT_RATE = 1.8e17;
const AREA_KM2 = 1500;
const m0 = (m: number): number => 10 ** (1.5 * m + 9.05);
const beta = Math.LN10;

function simpson(f: (x: number) => number, a: number, b: number, n = 20000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += f(a + i * h) * (i % 2 ? 4 : 2);
  return (s * h) / 3;
}

const recurrence = (shape: MomentBalancedRecurrence['shape']): MomentBalancedRecurrence => ({
  type: 'moment-balanced',
  slipRateMmYr: 4,
  bValue: 1,
  mMin: 5,
  mMax: 7.5,
  shape,
  shearModulusPa: 3e10,
});

/** The 0.1-unit bins of a shape over AREA_KM2. */
const bins = (shape: MomentBalancedRecurrence['shape']) =>
  magnitudeBins(recurrence(shape), { magnitudeStep: 0.1 }, AREA_KM2);

describe('moment-balanced rates', () => {
  for (const shape of ['gutenberg-richter', 'characteristic'] as const) {
    it(`${shape}: the bins release μ A s`, () => {
      const { magnitudes, annualRates } = bins(shape);
      const released = annualRates.reduce((s, r, i) => s + r * m0(magnitudes[i] as number), 0);
      expectRelative(
        released,
        MOMENT_RATE,
        1e-9,
        'μ A s, sum over bins of rate x M0 (Hanks & Kanamori 1979)',
      );
    });
  }

  it('gutenberg-richter: the continuous truncated exponential releases μ A s within 0.5%', () => {
    const { annualRates } = bins('gutenberg-richter');
    const n0 = annualRates.reduce((s, r) => s + r, 0);
    const density = (m: number): number =>
      (beta * Math.exp(-beta * (m - 5))) / (1 - Math.exp(-beta * 2.5));
    expectRelative(
      n0 * simpson((m) => density(m) * m0(m), 5, 7.5),
      MOMENT_RATE,
      0.005,
      'integral of N0 f(m) M0(m)',
    );
  });

  it('characteristic: the continuous Youngs & Coppersmith density releases μ A s within 0.5%', () => {
    const { annualRates } = bins('characteristic');
    const n0 = annualRates.reduce((s, r) => s + r, 0);
    const d = 1 - Math.exp(-beta * 2);
    const c2 = (beta * Math.exp(-beta * 1) * 0.5) / d;
    const density = (m: number): number =>
      (m < 7 ? beta * Math.exp(-beta * (m - 5)) : beta * Math.exp(-beta * 1)) / d / (1 + c2);
    const released =
      n0 * (simpson((m) => density(m) * m0(m), 5, 7) + simpson((m) => density(m) * m0(m), 7, 7.5));
    expectRelative(released, MOMENT_RATE, 0.005, 'integral of N0 f(m) M0(m)');
  });

  it('refuses to balance without a fault area', () => {
    expect(() => magnitudeBins(recurrence('gutenberg-richter'), { magnitudeStep: 0.1 })).toThrow(
      InvalidInput,
    );
  });
});
