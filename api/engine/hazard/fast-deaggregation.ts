import type { Deaggregation, DeaggregationBin } from '../results.ts';
import { accumulate, accumulatedTotals, compensatedSum, createLevelAccumulator, type LevelAccumulator } from '../summation.ts';
import { distanceBin, distanceBinRange, epsilonBin, epsilonBinRange, magnitudeBin, magnitudeBinRange } from './deaggregation-bins.ts';
import type { BranchPredictions } from './fast-site-hazard.ts';
import type { RuptureTable } from './rupture-table.ts';
import { exceedanceFromTable, type ExceedanceTable } from './exceedance-table.ts';
import { standardisedLevel } from './truncated-exceedance.ts';

export interface FastDeaggregationOptions {
  readonly measure: string;
  readonly level: number;
  readonly returnPeriodYears: number;
  readonly table: RuptureTable;
  /** The branches' predictions of the measure at the site (fastSiteHazard's firstMeasure). */
  readonly branches: readonly BranchPredictions[];
  /** Names by source index (the source id is used where missing). */
  readonly sourceNames: readonly string[];
  /** The fast path's truncated exceedance (exceedance-table.ts). */
  readonly exceedance: ExceedanceTable;
}

/** ε of a zero-σ prediction is held at ±10, as deaggregation.ts holds it. */
const EPSILON_LIMIT = 10;
// Slots of each accumulator: contribution, and contribution × M, × R, × ε (as in deaggregation.ts).
const RATE = 0;
const M = 1;
const R = 2;
const E = 3;

interface Bin {
  readonly m: number;
  readonly r: number;
  readonly e: number;
  readonly acc: LevelAccumulator;
}

/** A numeric key for an (M, R, ε) bin: ε bins are 0–5 and distance bins stay far below 10^6. */
const binKey = (m: number, r: number, e: number): number => (m * 1_000_000 + r) * 8 + e;

/**
 * deaggregate (deaggregation.ts) over the fast path's predictions: the same contributions
 * (weight × rate × truncated P, here from the table of exceedance-table.ts) in the same order
 * into the same bins and compensated sums, read from the rupture table and typed arrays
 * instead of Rupture objects and string-keyed bins. Null when nothing exceeds the level.
 */
export function fastDeaggregate(options: FastDeaggregationOptions): Deaggregation | null {
  const { table, exceedance } = options;
  const lnLevel = Math.log(options.level);
  const bins = new Map<number, Bin>();
  const bySource = new Map<number, LevelAccumulator>();
  const overall = createLevelAccumulator(4);
  let minEpsilon = Infinity;
  let maxEpsilon = -Infinity;
  const add = (acc: LevelAccumulator, contribution: number, magnitude: number, distanceKm: number, epsilon: number): void => {
    accumulate(acc, RATE, contribution);
    accumulate(acc, M, contribution * magnitude);
    accumulate(acc, R, contribution * distanceKm);
    accumulate(acc, E, contribution * epsilon);
  };

  for (const { weight, ruptureIndex, lnMedian, sigma, rrupKm } of options.branches) {
    for (let k = 0; k < ruptureIndex.length; k++) {
      const i = ruptureIndex[k] as number;
      const rawEpsilon = standardisedLevel(lnLevel, lnMedian[k] as number, sigma[k] as number);
      const contribution = weight * (table.annualRate[i] as number) * exceedanceFromTable(exceedance, rawEpsilon);
      if (!(contribution > 0)) continue;
      const epsilon = Math.max(-EPSILON_LIMIT, Math.min(EPSILON_LIMIT, rawEpsilon));
      const magnitude = table.magnitude[i] as number;
      const distanceKm = rrupKm[k] as number;
      minEpsilon = Math.min(minEpsilon, epsilon);
      maxEpsilon = Math.max(maxEpsilon, epsilon);
      const m = magnitudeBin(magnitude);
      const r = distanceBin(distanceKm);
      const e = epsilonBin(epsilon);
      const key = binKey(m, r, e);
      let bin = bins.get(key);
      if (!bin) {
        bin = { m, r, e, acc: createLevelAccumulator(4) };
        bins.set(key, bin);
      }
      add(bin.acc, contribution, magnitude, distanceKm, epsilon);
      add(overall, contribution, magnitude, distanceKm, epsilon);
      const sourceIndex = table.sourceIndex[i] as number;
      let source = bySource.get(sourceIndex);
      if (!source) {
        source = createLevelAccumulator(1);
        bySource.set(sourceIndex, source);
      }
      accumulate(source, 0, contribution);
    }
  }

  const [total, sumM, sumR, sumE] = accumulatedTotals(overall) as [number, number, number, number];
  if (!(total > 0)) return null;

  const binTotals = [...bins.values()].map((bin) => ({ bin, totals: accumulatedTotals(bin.acc) }));
  const binSum = compensatedSum(binTotals.map((b) => b.totals[RATE] as number));
  binTotals.sort((a, b) => a.bin.m - b.bin.m || a.bin.r - b.bin.r || a.bin.e - b.bin.e);
  const resultBins: DeaggregationBin[] = binTotals.map(({ bin, totals }) => ({
    magnitude: magnitudeBinRange(bin.m),
    distanceKm: distanceBinRange(bin.r),
    epsilon: epsilonBinRange(bin.e, minEpsilon, maxEpsilon),
    share: (totals[RATE] as number) / binSum,
  }));
  let modal = binTotals[0] as (typeof binTotals)[number];
  for (const b of binTotals) if ((b.totals[RATE] as number) > (modal.totals[RATE] as number)) modal = b;
  const modalRate = modal.totals[RATE] as number;

  const sources = [...bySource.entries()].map(([sourceIndex, acc]) => {
    const sourceId = table.sourceIds[sourceIndex] as string;
    return { sourceId, name: options.sourceNames[sourceIndex] ?? sourceId, rate: accumulatedTotals(acc)[0] as number };
  });
  const sourceSum = compensatedSum(sources.map((s) => s.rate));
  const bySourceShares = sources
    .map(({ sourceId, name, rate }) => ({ sourceId, name, share: rate / sourceSum }))
    .sort((a, b) => b.share - a.share || (a.sourceId < b.sourceId ? -1 : a.sourceId > b.sourceId ? 1 : 0));

  return {
    measure: options.measure,
    level: options.level,
    returnPeriodYears: options.returnPeriodYears,
    bySource: bySourceShares,
    mean: { magnitude: sumM / total, distanceKm: sumR / total, epsilon: sumE / total },
    mode: {
      magnitude: (modal.totals[M] as number) / modalRate,
      distanceKm: (modal.totals[R] as number) / modalRate,
      epsilon: (modal.totals[E] as number) / modalRate,
    },
    bins: resultBins,
  };
}
