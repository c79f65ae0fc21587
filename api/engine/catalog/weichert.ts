import { InvalidInput, TremoraError } from '../errors.ts';
import { compensatedSum } from '../summation.ts';
import type { ObservationBin } from './completeness-periods.ts';

/**
 * Gutenberg–Richter parameters by maximum likelihood for bins observed over unequal periods:
 * Weichert (1980), "Estimation of the earthquake recurrence parameters for unequal observation
 * periods for different magnitudes", BSSA 70(4), 1337–1346 (equations from memory).
 * With β = b ln 10, bins m_i observed t_i years holding n_i of N events, β solves
 *   Σ t_i m_i e^(−β m_i) / Σ t_i e^(−β m_i) = Σ n_i m_i / N,
 * var(β) = 1 / (N (S2/S0 − (S1/S0)²)) with Sk = Σ t_i m_i^k e^(−β m_i), and the annual rate
 * over the bins is N Σ e^(−β m_i) / Σ t_i e^(−β m_i), with standard error rate / sqrt(N).
 *
 * Solved by Newton's method kept inside a bracket (bisection when a step leaves it). The left
 * side falls steadily with β, so the root is unique. Converged when a step changes β by less
 * than 1e-10 (b by under 5e-11, far below any sampling error).
 */
export interface WeichertEstimate {
  readonly bValue: number;
  readonly sigmaB: number;
  readonly beta: number;
  readonly sigmaBeta: number;
  /** The magnitude the rate counts from: lowest bin centre − ΔM/2. */
  readonly referenceMagnitude: number;
  /** Annual rate of M >= referenceMagnitude (over the bins used). */
  readonly rateAtReference: number;
  readonly sigmaRate: number;
  /** log10 N(M >= m) = aValue − bValue m per year. */
  readonly aValue: number;
  readonly eventCount: number;
  readonly iterations: number;
}

export interface WeichertOptions {
  readonly magnitudeStep: number;
  /** Convergence tolerance on β; default 1e-10. */
  readonly toleranceBeta?: number;
  /** Default 200; a failure to converge throws. */
  readonly maxIterations?: number;
}

/** Largest |β| searched: b of ±13, beyond anything a catalog shows. */
const BETA_BOUND = 30;

/** Weichert (1980) fit of bins with their counts and observation years. */
export function weichertFit(
  bins: readonly ObservationBin[],
  options: WeichertOptions,
): WeichertEstimate {
  const tolerance = options.toleranceBeta ?? 1e-10;
  const maxIterations = options.maxIterations ?? 200;
  bins.forEach((b, i) => {
    if (!(Number.isInteger(b.count) && b.count >= 0))
      throw new InvalidInput([
        { path: `bins[${i}].count`, message: `expected a whole number of events; got ${b.count}` },
      ]);
    if (!(b.years > 0 && Number.isFinite(b.years)))
      throw new InvalidInput([
        {
          path: `bins[${i}].years`,
          message: `expected observation years greater than 0; got ${b.years}`,
        },
      ]);
  });
  const occupied = bins.filter((b) => b.count > 0).length;
  if (occupied < 2) {
    throw new InvalidInput([
      {
        path: 'bins',
        message: `expected events in at least 2 magnitude bins for a Weichert fit; got ${occupied}`,
      },
    ]);
  }
  const m0 = Math.min(...bins.map((b) => b.magnitude));
  // Magnitudes relative to the lowest bin keep the exponentials near 1.
  const dm = bins.map((b) => b.magnitude - m0);
  const n = compensatedSum(bins.map((b) => b.count));
  const observedMean = compensatedSum(bins.map((b, i) => b.count * (dm[i] as number))) / n;
  const moments = (beta: number): { s0: number; s1: number; s2: number } => {
    const w = bins.map((b, i) => b.years * Math.exp(-beta * (dm[i] as number)));
    return {
      s0: compensatedSum(w),
      s1: compensatedSum(w.map((x, i) => x * (dm[i] as number))),
      s2: compensatedSum(w.map((x, i) => x * (dm[i] as number) ** 2)),
    };
  };
  const excessMean = (beta: number): number => {
    const { s0, s1 } = moments(beta);
    return s1 / s0 - observedMean;
  };
  let lo = -BETA_BOUND;
  let hi = BETA_BOUND;
  if (!(excessMean(lo) > 0 && excessMean(hi) < 0)) {
    throw new TremoraError(
      `Weichert fit: no b-value between ${-BETA_BOUND / Math.LN10} and ${BETA_BOUND / Math.LN10} fits these bins`,
    );
  }
  let beta = Math.LN10;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const { s0, s1, s2 } = moments(beta);
    const f = s1 / s0 - observedMean;
    const variance = s2 / s0 - (s1 / s0) ** 2;
    if (f > 0) lo = beta;
    else hi = beta;
    let next = beta + f / variance;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    const change = Math.abs(next - beta);
    beta = next;
    if (change < tolerance)
      return estimate(dm, m0, n, beta, options.magnitudeStep, iteration, moments);
  }
  throw new TremoraError(
    `Weichert fit did not converge to ${tolerance} in β within ${maxIterations} iterations`,
  );
}

function estimate(
  dm: readonly number[],
  m0: number,
  n: number,
  beta: number,
  step: number,
  iterations: number,
  moments: (beta: number) => { s0: number; s1: number; s2: number },
): WeichertEstimate {
  const { s0, s1, s2 } = moments(beta);
  const sigmaBeta = 1 / Math.sqrt(n * (s2 / s0 - (s1 / s0) ** 2));
  const rate = (n * compensatedSum(dm.map((d) => Math.exp(-beta * d)))) / s0;
  const bValue = beta / Math.LN10;
  const referenceMagnitude = m0 - step / 2;
  return {
    bValue,
    sigmaB: sigmaBeta / Math.LN10,
    beta,
    sigmaBeta,
    referenceMagnitude,
    rateAtReference: rate,
    sigmaRate: rate / Math.sqrt(n),
    aValue: Math.log10(rate) + bValue * referenceMagnitude,
    eventCount: n,
    iterations,
  };
}
