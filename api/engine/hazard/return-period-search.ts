import { levelAtAnnualRate, type CurveLevel } from './curve-interpolation.ts';

/** A return period's level with where it was found: `index` is the first level whose rate is at most 1/years (−1 when none). */
export interface SearchedLevel extends CurveLevel {
  readonly index: number;
}

/**
 * levelAtReturnPeriod (curve-interpolation.ts) for a curve whose rates are read on demand
 * (fast-site-rates.ts): the first level whose rate is at most 1/years is found by looking at
 * `hint` and its neighbour first (a map's next point usually crosses where its last one did),
 * then by halving, since a hazard curve does not increase with level; then the same log–log
 * reading between it and the level below. The answer is levelAtReturnPeriod's on the full
 * curve; two to about log₂(levels) + 3 rates are read instead of all of them.
 */
export function levelAtReturnPeriodBySearch(
  levels: readonly number[],
  rateAt: (levelIndex: number) => number,
  years: number,
  hint?: number,
): SearchedLevel {
  const target = 1 / years;
  const known = new Map<number, number>();
  const rate = (j: number): number => {
    let r = known.get(j);
    if (r === undefined) {
      r = rateAt(j);
      known.set(j, r);
    }
    return r;
  };
  const last = levels.length - 1;
  if (last < 0) return { level: null, status: 'below-lowest-level', index: -1 };

  // The first j in [lo, hi] with rate(j) <= target, given rate(hi) <= target.
  const halve = (lo: number, hi: number): number => {
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (rate(mid) <= target) hi = mid;
      else lo = mid + 1;
    }
    return hi;
  };
  const guess = Math.min(last, Math.max(0, hint ?? last >> 1));
  let j: number;
  if (rate(guess) <= target) {
    j = guess === 0 || rate(guess - 1) > target ? guess : halve(0, guess - 1);
  } else if (guess < last && rate(guess + 1) <= target) {
    j = guess + 1;
  } else if (guess === last || rate(last) > target) {
    return { level: null, status: 'above-highest-level', index: -1 };
  } else {
    j = halve(guess + 2, last);
  }
  // For j > 0, rate(0) >= rate(j − 1) > target: only j = 0 can fall below the curve.
  if (j === 0 && rate(0) < target) return { level: null, status: 'below-lowest-level', index: 0 };
  if (j === 0 || rate(j) === target) return { level: levels[j] as number, status: 'ok', index: j };
  return {
    ...levelAtAnnualRate(
      [levels[j - 1] as number, levels[j] as number],
      [rate(j - 1), rate(j)],
      target,
    ),
    index: j,
  };
}
