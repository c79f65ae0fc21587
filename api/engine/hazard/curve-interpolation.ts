import type { ReturnPeriodStatus } from '../results.ts';

/**
 * Reading a hazard curve between its levels: log–log interpolation (ln rate linear in ln level),
 * the common practice since hazard curves are close to straight on log–log axes. Where the
 * lower-rate end of a segment is 0 (the curve drops to nothing within it, as it does under a
 * truncated distribution), ln rate is undefined there, so the rate is taken linear in ln level
 * on that segment instead (a choice, stated here; it only touches the curve's very end).
 * `levels` increasing and positive; `annualRate` non-increasing.
 */

export interface CurveLevel {
  readonly level: number | null;
  readonly status: ReturnPeriodStatus;
}

/** The level exceeded at `targetRate` per year, or null with the side on which it falls off the curve. */
export function levelAtAnnualRate(
  levels: readonly number[],
  annualRate: readonly number[],
  targetRate: number,
): CurveLevel {
  const first = annualRate[0];
  if (first === undefined || first < targetRate)
    return { level: null, status: 'below-lowest-level' };
  const j = annualRate.findIndex((rate) => rate <= targetRate);
  if (j === -1) return { level: null, status: 'above-highest-level' };
  if (j === 0 || annualRate[j] === targetRate) return { level: levels[j] as number, status: 'ok' };
  const x0 = Math.log(levels[j - 1] as number);
  const x1 = Math.log(levels[j] as number);
  const r0 = annualRate[j - 1] as number;
  const r1 = annualRate[j] as number;
  const fraction =
    r1 > 0 ? Math.log(targetRate / r0) / Math.log(r1 / r0) : (targetRate - r0) / (r1 - r0);
  return { level: Math.exp(x0 + fraction * (x1 - x0)), status: 'ok' };
}

/** The level with a return period of `years` (annual rate 1 / years). */
export function levelAtReturnPeriod(
  levels: readonly number[],
  annualRate: readonly number[],
  years: number,
): CurveLevel {
  return levelAtAnnualRate(levels, annualRate, 1 / years);
}

export interface CurveRate {
  readonly annualRate: number;
  /**
   * 'ok' inside the levels. Off the curve the rate is a bound: below the lowest level, the rate
   * at the lowest level (a lower bound); above the highest, the rate there (an upper bound).
   */
  readonly status: ReturnPeriodStatus;
}

/** The annual rate of exceeding `level`, read from the curve. */
export function annualRateAtLevel(
  levels: readonly number[],
  annualRate: readonly number[],
  level: number,
): CurveRate {
  const last = levels.length - 1;
  if (last < 0) return { annualRate: 0, status: 'above-highest-level' };
  if (level < (levels[0] as number))
    return { annualRate: annualRate[0] as number, status: 'below-lowest-level' };
  if (level > (levels[last] as number))
    return { annualRate: annualRate[last] as number, status: 'above-highest-level' };
  const j = levels.findIndex((l) => l >= level);
  if (levels[j] === level || j === 0) return { annualRate: annualRate[j] as number, status: 'ok' };
  const r0 = annualRate[j - 1] as number;
  const r1 = annualRate[j] as number;
  const fraction =
    Math.log(level / (levels[j - 1] as number)) /
    Math.log((levels[j] as number) / (levels[j - 1] as number));
  if (r0 === 0) return { annualRate: 0, status: 'ok' };
  const rate =
    r1 > 0 ? Math.exp(Math.log(r0) + fraction * Math.log(r1 / r0)) : r0 + fraction * (r1 - r0);
  return { annualRate: rate, status: 'ok' };
}
