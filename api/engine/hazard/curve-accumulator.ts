import type { PairPredictions } from '../motion/types.ts';
import { accumulate, createLevelAccumulator, type LevelAccumulator } from '../summation.ts';
import type { ExceedanceTable } from './exceedance-table.ts';
import { exceedanceProbability, standardisedLevel } from './truncated-exceedance.ts';

/**
 * One hazard curve summed pair by pair: Σ rate × P(IM > level) over (rupture, site) pairs, as
 * the plain sum (test/helpers/reference-hazard/exceedance-curve.ts) adds it, with three
 * savings. All levels of a pair come from one ε₀ per level, (ln level − ln median) / σ, with 1/σ computed once. Levels the pair
 * exceeds for certain (ε ≤ −n) are not visited one by one: the rate is recorded once at the
 * last of them and spread over the levels below when the curve is read (suffix sums of
 * positive terms, so nothing cancels). The loop stops at the first level with ε ≥ n.
 * Terms are added plainly within a block of at most BLOCK_PAIRS pairs, and blocks are folded
 * into compensated sums (summation.ts): the block's rounding stays below BLOCK_PAIRS ulps of
 * its total, and the many blocks of a large study add without loss.
 */
export const BLOCK_PAIRS = 1024;

export interface CurveAccumulator {
  readonly lnLevels: Float64Array;
  /** This block's sums of rate × P at each level, for pairs that exceed it by chance. */
  readonly partial: Float64Array;
  /** This block's rates of pairs that exceed every level up to and including j for certain, at j. */
  readonly certain: Float64Array;
  readonly partialTotal: LevelAccumulator;
  readonly certainTotal: LevelAccumulator;
  pairsInBlock: number;
}

export function createCurveAccumulator(levels: readonly number[]): CurveAccumulator {
  const n = levels.length;
  return {
    lnLevels: Float64Array.from(levels, Math.log),
    partial: new Float64Array(n),
    certain: new Float64Array(n),
    partialTotal: createLevelAccumulator(n),
    certainTotal: createLevelAccumulator(n),
    pairsInBlock: 0,
  };
}

function foldBlock(acc: CurveAccumulator): void {
  for (let j = 0; j < acc.partial.length; j++) {
    if (acc.partial[j] !== 0) accumulate(acc.partialTotal, j, acc.partial[j] as number);
    if (acc.certain[j] !== 0) accumulate(acc.certainTotal, j, acc.certain[j] as number);
    acc.partial[j] = 0;
    acc.certain[j] = 0;
  }
  acc.pairsInBlock = 0;
}

/**
 * What the pair loops read of an exceedance table (exceedance-table.ts): the truncation n (0 for
 * the step), and for a tabulated one its cubics, their scale and count (undefined, 0, 0 otherwise).
 */
function inlineTable(exceedance: ExceedanceTable) {
  const table = exceedance.mode === 'table' ? exceedance : undefined;
  return {
    n: exceedance.mode === 'step' ? 0 : exceedance.truncationSigma,
    cubic: table?.cubic,
    scale: table?.scale ?? 0,
    intervals: table?.intervals ?? 0,
  };
}

/**
 * One branch's pairs at a site, for one measure: pair k is of rupture pairRupture[k], whose
 * annual rate is rates[pairRupture[k]], and has prediction k of `predictions`; `count` pairs.
 */
export interface RatedPairs {
  readonly rates: Float64Array;
  readonly pairRupture: Int32Array;
  readonly predictions: PairPredictions;
  readonly count: number;
}

/**
 * Adds the pairs to the curve. Returns −1, or the first pair whose ln median is not finite or whose σ is not
 * a finite number ≥ 0 (nothing of it or after it is added; the caller reports it).
 */
export function accumulatePairs(
  acc: CurveAccumulator,
  exceedance: ExceedanceTable,
  pairs: RatedPairs,
): number {
  const { rates, pairRupture, predictions, count } = pairs;
  const { lnLevels, partial, certain } = acc;
  const levelCount = lnLevels.length;
  const { lnMedian: lnMedians, sigma: sigmas } = predictions;
  // The table's cubics, evaluated inline here: this loop runs for every level of every pair.
  const { n, cubic, scale, intervals } = inlineTable(exceedance);

  for (let k = 0; k < count; k++) {
    const mu = lnMedians[k] as number;
    const sigma = sigmas[k] as number;
    if (!(mu > -Infinity && mu < Infinity && sigma >= 0 && sigma < Infinity)) return k;
    const rate = rates[pairRupture[k] as number] as number;
    if (rate === 0) continue;
    if (++acc.pairsInBlock > BLOCK_PAIRS) {
      foldBlock(acc);
      acc.pairsInBlock = 1;
    }
    let j = 0;
    if (sigma === 0 || n === 0) {
      // A step: every level below the median is exceeded, none at or above it (truncated-exceedance.ts).
      while (j < levelCount && (lnLevels[j] as number) < mu) j++;
      if (j > 0) certain[j - 1] = (certain[j - 1] as number) + rate;
      continue;
    }
    if (cubic) {
      const lowest = mu - n * sigma;
      while (j < levelCount && (lnLevels[j] as number) <= lowest) j++;
      if (j > 0) certain[j - 1] = (certain[j - 1] as number) + rate;
      // The node position (ε + n) × scale of each level, as a × ln level + b: one multiply-add per level.
      const a = scale / sigma;
      const b = n * scale - mu * a;
      for (; j < levelCount; j++) {
        let x = a * (lnLevels[j] as number) + b;
        if (x >= intervals) break;
        if (x < 0) x = 0;
        const i = x | 0;
        const t = x - i;
        const at = i << 2;
        partial[j] =
          (partial[j] as number) +
          rate *
            ((cubic[at] as number) +
              t *
                ((cubic[at + 1] as number) +
                  t * ((cubic[at + 2] as number) + t * (cubic[at + 3] as number))));
      }
      continue;
    }
    for (; j < levelCount; j++) {
      const p = exceedanceProbability(standardisedLevel(lnLevels[j] as number, mu, sigma), n);
      if (p === 0) break;
      partial[j] = (partial[j] as number) + rate * p;
    }
  }
  return -1;
}

/** The curve's annual rates, one per level: the compensated sums, certain rates spread down. */
export function curveRates(acc: CurveAccumulator): number[] {
  foldBlock(acc);
  const n = acc.lnLevels.length;
  const out = createLevelAccumulator(n);
  const { partialTotal: p, certainTotal: c } = acc;
  for (let j = n - 1; j >= 0; j--) {
    accumulate(out, j, (p.sum[j] as number) + (p.compensation[j] as number));
    // Rates certain at level i count at every level up to i: a suffix sum from the top.
    for (let i = j; i < n; i++) {
      const certainRate = (c.sum[i] as number) + (c.compensation[i] as number);
      if (certainRate !== 0) accumulate(out, j, certainRate);
    }
  }
  return Array.from(out.sum, (s, j) => s + (out.compensation[j] as number));
}

/** Clears the accumulator for the next site. */
export function resetCurveAccumulator(acc: CurveAccumulator): void {
  acc.partial.fill(0);
  acc.certain.fill(0);
  for (const total of [acc.partialTotal, acc.certainTotal]) {
    total.sum.fill(0);
    total.compensation.fill(0);
  }
  acc.pairsInBlock = 0;
}

/**
 * The annual rate of exceeding one level (ln units) from the pairs: the sum accumulatePairs
 * forms at that level, the same terms added the same way, for a search that needs a few levels
 * of a curve and not all (map/return-period search). Assumes predictions already checked finite.
 */
export function levelRate(lnLevel: number, exceedance: ExceedanceTable, pairs: RatedPairs): number {
  const { rates, pairRupture, predictions, count } = pairs;
  const { lnMedian: lnMedians, sigma: sigmas } = predictions;
  const { n, cubic, scale, intervals } = inlineTable(exceedance);
  const total = createLevelAccumulator(1);
  let block = 0;
  let inBlock = 0;
  for (let k = 0; k < count; k++) {
    const rate = rates[pairRupture[k] as number] as number;
    if (rate === 0) continue;
    if (++inBlock > BLOCK_PAIRS) {
      accumulate(total, 0, block);
      block = 0;
      inBlock = 1;
    }
    const mu = lnMedians[k] as number;
    const sigma = sigmas[k] as number;
    if (sigma === 0 || n === 0) {
      if (lnLevel < mu) block += rate;
    } else if (cubic) {
      if (lnLevel <= mu - n * sigma) {
        block += rate;
        continue;
      }
      const a = scale / sigma;
      let x = a * lnLevel + (n * scale - mu * a);
      if (x >= intervals) continue;
      if (x < 0) x = 0;
      const i = x | 0;
      const t = x - i;
      const at = i << 2;
      block +=
        rate *
        ((cubic[at] as number) +
          t *
            ((cubic[at + 1] as number) +
              t * ((cubic[at + 2] as number) + t * (cubic[at + 3] as number))));
    } else {
      block += rate * exceedanceProbability(standardisedLevel(lnLevel, mu, sigma), n);
    }
  }
  accumulate(total, 0, block);
  return (total.sum[0] as number) + (total.compensation[0] as number);
}

/**
 * levelRate's per-pair numbers worked out once for a site, for a search that reads several
 * levels (fast-site-rates.ts): each pair's rate and the node position of a level as
 * a × ln level + b, so a level costs a multiply-add per pair. Only for a tabulated exceedance
 * and σ > 0 throughout; `usable` is false otherwise and levelRate serves instead.
 */
export interface LevelCoefficients {
  readonly rate: Float64Array;
  readonly a: Float64Array;
  readonly b: Float64Array;
  count: number;
  usable: boolean;
}

export function createLevelCoefficients(capacity: number): LevelCoefficients {
  return {
    rate: new Float64Array(capacity),
    a: new Float64Array(capacity),
    b: new Float64Array(capacity),
    count: 0,
    usable: false,
  };
}

export function fillLevelCoefficients(
  into: LevelCoefficients,
  exceedance: ExceedanceTable,
  pairs: RatedPairs,
): void {
  const { rates, pairRupture, predictions, count } = pairs;
  into.count = 0;
  into.usable = false;
  if (exceedance.mode !== 'table') return;
  const { scale, truncationSigma: n } = exceedance;
  let kept = 0;
  for (let k = 0; k < count; k++) {
    const rate = rates[pairRupture[k] as number] as number;
    if (rate === 0) continue;
    const sigma = predictions.sigma[k] as number;
    if (!(sigma > 0)) return;
    const a = scale / sigma;
    into.rate[kept] = rate;
    into.a[kept] = a;
    into.b[kept] = n * scale - (predictions.lnMedian[k] as number) * a;
    kept++;
  }
  into.count = kept;
  into.usable = true;
}

/** levelRate from filled coefficients (same terms, same blocks, same compensated sum). */
export function coefficientLevelRate(
  lnLevel: number,
  exceedance: Extract<ExceedanceTable, { mode: 'table' }>,
  c: LevelCoefficients,
): number {
  const { cubic, intervals } = exceedance;
  const { rate, a, b, count } = c;
  const total = createLevelAccumulator(1);
  let block = 0;
  for (let start = 0; start < count; start += BLOCK_PAIRS) {
    const end = Math.min(count, start + BLOCK_PAIRS);
    for (let k = start; k < end; k++) {
      const x = (a[k] as number) * lnLevel + (b[k] as number);
      if (x >= intervals) continue;
      if (x <= 0) {
        block += rate[k] as number;
        continue;
      }
      const i = x | 0;
      const t = x - i;
      const at = i << 2;
      block +=
        (rate[k] as number) *
        ((cubic[at] as number) +
          t *
            ((cubic[at + 1] as number) +
              t * ((cubic[at + 2] as number) + t * (cubic[at + 3] as number))));
    }
    accumulate(total, 0, block);
    block = 0;
  }
  return (total.sum[0] as number) + (total.compensation[0] as number);
}
