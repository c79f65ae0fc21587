import { describe, expect, it } from 'vitest';
import { characteristicBinProbabilities } from '../../../api/engine/recurrence/characteristic.ts';
import { magnitudeEdges } from '../../../api/engine/recurrence/magnitude-bins.ts';
import { expectRelative } from '../../helpers/close.ts';

/*
 * Youngs & Coppersmith (1985) characteristic distribution, their stated assumptions (from
 * memory): box 0.5 units wide at the top (Δm2), height equal to the exponential density 1.0
 * unit below the box (Δm1). Hand evaluation for mMin 5, mMax 7.5, b 1 (so mc = 7.0):
 *   c2 = β 10^-(7.0 - 1.0 - 5.0) x 0.5 / (1 - 10^-2) = 0.5 x 2.302585 x 0.1 / 0.99 = 0.1162922,
 *   box share c2 / (1 + c2) = 0.1041772.
 */
describe('characteristicBinProbabilities', () => {
  const edges = magnitudeEdges(5, 7.5, 0.1);
  const p = characteristicBinProbabilities(edges, 5, 7.5, 1);

  it('sums to 1', () => {
    expectRelative(
      p.reduce((s, x) => s + x, 0),
      1,
      1e-12,
      'normalised density',
    );
  });

  it('the box holds c2 / (1 + c2) = 0.1041772', () => {
    const box = p.slice(20).reduce((s, x) => s + x, 0);
    expectRelative(box, 0.1041772, 1e-6, 'Youngs & Coppersmith 1985 box share, evaluated by hand');
    for (const x of p.slice(20)) expectRelative(x, 0.1041772 / 5, 1e-6, 'uniform box: equal bins');
  });

  it('box height equals the exponential density at mc - 1 (ratio of the 6.0–6.1 bin to a box bin)', () => {
    // Exponential bin mass / box bin mass = (1 - 10^-0.1) / (0.1 β) = 0.8932211 when the box
    // height is the density at 6.0, the lower edge of that exponential bin.
    expectRelative(
      (p[10] ?? NaN) / (p[20] ?? NaN),
      (1 - 10 ** -0.1) / (0.1 * Math.LN10),
      1e-12,
      'Youngs & Coppersmith 1985 box height',
    );
  });

  it('refuses a range no wider than the box', () => {
    expect(() => characteristicBinProbabilities([5, 5.5], 5, 5.5, 1)).toThrow(/characteristic/);
  });
});
