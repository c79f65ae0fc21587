import { describe, expect, it } from 'vitest';
import { fractileCurves, weightedFractiles } from '../../../api/engine/hazard/fractiles.ts';
import { treeDraws } from '../../../api/engine/hazard/tree-combinations.ts';
import { expectClose } from '../../helpers/close.ts';

// Made-up values: the checks are the definition of a weighted fractile (inverse of the weighted
// empirical distribution), worked by hand.
describe('weighted fractiles', () => {
  it('values 1, 2, 3 with weights 0.2, 0.3, 0.5: 16th → 1, 50th → 2 (cumulative 0.5 reaches 0.5), 84th → 3, 21st → 2', () => {
    expect(weightedFractiles([3, 1, 2], [0.5, 0.2, 0.3], [0.16, 0.5, 0.84, 0.21])).toEqual([
      1, 2, 3, 2,
    ]);
  });

  it('a fractile on a boundary of products of weights that do not sum to exactly 1 (0.1 × 3 + 0.7)', () => {
    expect(weightedFractiles([1, 2], [0.1 + 0.1 + 0.1, 0.7], [0.3])).toEqual([1]);
  });

  it('fractile curves are taken level by level: crossing curves give a fractile curve that is neither', () => {
    const curves = fractileCurves(
      [
        [0.1, 0.001],
        [0.2, 0.0005],
      ],
      [0.5, 0.5],
      [0.84],
      2,
    );
    expect(curves['0.84']).toEqual([0.2, 0.001]);
  });
});

describe('tree combinations', () => {
  it('lists every combination with the product of its weights when within the limit (first point slowest)', () => {
    const draws = treeDraws([
      [0.4, 0.6],
      [0.5, 0.25, 0.25],
    ]);
    expect(draws.total).toBe(6);
    expect(draws.sampled).toBe(false);
    expect(draws.picks).toEqual([
      [0, 0],
      [0, 1],
      [0, 2],
      [1, 0],
      [1, 1],
      [1, 2],
    ]);
    draws.weights.forEach((w, c) =>
      expectClose(w, [0.2, 0.1, 0.1, 0.3, 0.15, 0.15][c]!, 1e-15, 'product of weights, by hand'),
    );
  });

  it('beyond the limit draws a fixed-seed sample whose shares match the weights within 5 standard errors (binomial)', () => {
    const draws = treeDraws([[0.3, 0.7]], 1, 2000);
    expect(draws.sampled).toBe(true);
    expect(draws.picks).toHaveLength(2000);
    const share = draws.picks.filter((p) => p[0] === 0).length / 2000;
    expectClose(share, 0.3, 5 * Math.sqrt((0.3 * 0.7) / 2000), 'binomial standard error');
    expect(treeDraws([[0.3, 0.7]], 1, 2000).picks).toEqual(draws.picks);
  });
});
