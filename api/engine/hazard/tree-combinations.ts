import { createRandom } from '../random.ts';

/**
 * The combinations of a logic tree's branch points are listed exactly up to this many (e.g.
 * 32 ground-motion combinations × two sources of 54 variants would be 93,312: sampled).
 */
export const MAX_TREE_COMBINATIONS = 4096;

/**
 * Beyond MAX_TREE_COMBINATIONS, this many combinations are drawn, each branch point's choice by
 * its weights, independently, and each kept with weight 1 / TREE_SAMPLES. A weight share s
 * (of a band, or below a fractile) is then estimated with standard error √(s(1 − s) / N), at
 * most 0.011 for N = 2000 (binomial sampling, common practice); the mean curves never come
 * from the sample (they are exact, tree-magnitude-bins.ts).
 */
export const TREE_SAMPLES = 2000;

/** Fixed seed of the sample: the same study gives the same numbers. */
export const TREE_SAMPLE_SEED = 20261202;

export interface TreeDraws {
  /** picks[c][f]: the branch chosen at branch point f in combination c. */
  readonly picks: readonly (readonly number[])[];
  /** Weight of each combination (summing to 1). */
  readonly weights: readonly number[];
  /** How many combinations the whole tree has. */
  readonly total: number;
  readonly sampled: boolean;
}

/**
 * The combinations of independent branch points, each given by its branches' weights: every
 * one (the first point changing slowest, weight the product of the chosen weights) when there
 * are at most `maxCombinations`, else `samples` drawn with the fixed seed.
 */
export function treeDraws(
  points: readonly (readonly number[])[],
  maxCombinations = MAX_TREE_COMBINATIONS,
  samples = TREE_SAMPLES,
): TreeDraws {
  const total = points.reduce((n, w) => n * w.length, 1);
  if (total <= maxCombinations) {
    let picks: number[][] = [[]];
    let weights = [1];
    for (const point of points) {
      picks = picks.flatMap((chosen) => point.map((_, b) => [...chosen, b]));
      weights = weights.flatMap((w) => point.map((pw) => w * pw));
    }
    return { picks, weights, total, sampled: false };
  }
  const random = createRandom(TREE_SAMPLE_SEED);
  const draw = (point: readonly number[]): number => {
    const u = random.nextFloat() * point.reduce((s, w) => s + w, 0);
    let cumulative = 0;
    for (let b = 0; b < point.length; b++) {
      cumulative += point[b] as number;
      if (u < cumulative) return b;
    }
    return point.length - 1;
  };
  const picks = Array.from({ length: samples }, () => points.map(draw));
  return { picks, weights: picks.map(() => 1 / samples), total, sampled: true };
}
