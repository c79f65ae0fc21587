import type { Deaggregation, DeaggregationBin } from '../results.ts';
import {
  accumulate,
  accumulatedTotal,
  compensatedSum,
  createLevelAccumulator,
} from '../summation.ts';
import {
  DISTANCE_EDGES_KM,
  EPSILON_EDGES,
  distanceBin,
  distanceBinRange,
  epsilonBin,
  epsilonBinRange,
  magnitudeBin,
  magnitudeBinRange,
} from './deaggregation-bins.ts';
import type { BranchPredictions } from './fast-site-hazard.ts';
import type { RuptureTable } from './rupture-table.ts';
import { sourceShares, type SourceContribution } from './source-shares.ts';
import { exceedanceFromTable, type ExceedanceTable } from './exceedance-table.ts';
import { standardisedLevel } from './truncated-exceedance.ts';

/** What a deaggregation is of: one measure's level at a return period, and the sources' names. */
export interface DeaggregationTarget {
  readonly measure: string;
  /** The level deaggregated, in the measure's units (the return period's level). */
  readonly level: number;
  readonly returnPeriodYears: number;
  /** Names by source index (the source id is used where missing). */
  readonly sourceNames: readonly string[];
}

export interface FastDeaggregationOptions extends DeaggregationTarget {
  readonly table: RuptureTable;
  /** The branches' predictions of the measure at the site (fastSiteHazard's firstMeasure). */
  readonly branches: readonly BranchPredictions[];
  /** The fast path's truncated exceedance (exceedance-table.ts). */
  readonly exceedance: ExceedanceTable;
}

/** ε of a zero-σ prediction is held at ±10, as deaggregation.ts holds it. */
const EPSILON_LIMIT = 10;
// Slots of each bin's sums: contribution, and contribution × M, × R, × ε (as in deaggregation.ts).
const SLOTS = 4;
const EPSILON_BINS = EPSILON_EDGES.length + 1;

/**
 * distanceBin (deaggregation-bins.ts) by a lookup on 10 km steps below the last edge, which is
 * exact while every edge is a whole number of steps (checked here, else the lookup is not used).
 */
const DISTANCE_STEP_KM = 10;
const LAST_EDGE_KM = DISTANCE_EDGES_KM[DISTANCE_EDGES_KM.length - 1] as number;
const DISTANCE_LOOKUP = DISTANCE_EDGES_KM.every((edge) => edge % DISTANCE_STEP_KM === 0)
  ? Int32Array.from({ length: LAST_EDGE_KM / DISTANCE_STEP_KM }, (_, i) =>
      distanceBin(i * DISTANCE_STEP_KM),
    )
  : new Int32Array(0);
const distanceBinOf = (distanceKm: number): number => {
  const step = Math.floor(distanceKm / DISTANCE_STEP_KM);
  return step >= 0 && step < DISTANCE_LOOKUP.length
    ? (DISTANCE_LOOKUP[step] as number)
    : distanceBin(distanceKm);
};

/**
 * deaggregate (deaggregation.ts) over the fast path's predictions: the same contributions
 * (weight × rate × truncated P, here from the table of exceedance-table.ts) in the same order
 * into the same bins and compensated sums, read from the rupture table and typed arrays
 * instead of Rupture objects. A first pass finds each pair's contribution, ε and bins; a second
 * adds them into dense columns, one entry per bin in the order the result lists them
 * (magnitude, then distance, then ε). Null when nothing exceeds the level.
 */
export function fastDeaggregate(options: FastDeaggregationOptions): Deaggregation | null {
  const { table, exceedance, branches } = options;
  const lnLevel = Math.log(options.level);
  let pairs = 0;
  for (const b of branches) pairs += b.ruptureIndex.length;
  const contribution = new Float64Array(pairs);
  const epsilonOf = new Float64Array(pairs);
  const magnitudeBinOf = new Int32Array(pairs);
  const distanceBinOfPair = new Int32Array(pairs);
  let minEpsilon = Infinity;
  let maxEpsilon = -Infinity;
  let minM = Infinity;
  let maxM = -Infinity;
  let maxR = 0;

  let at = 0;
  for (const { weight, ruptureIndex, lnMedian, sigma, rrupKm } of branches) {
    for (let k = 0; k < ruptureIndex.length; k++, at++) {
      const i = ruptureIndex[k] as number;
      const s = sigma[k] as number;
      const rawEpsilon = standardisedLevel(lnLevel, lnMedian[k] as number, s);
      const c =
        weight * (table.annualRate[i] as number) * exceedanceFromTable(exceedance, rawEpsilon);
      if (!(c > 0)) continue;
      const epsilon = Math.max(-EPSILON_LIMIT, Math.min(EPSILON_LIMIT, rawEpsilon));
      const m = magnitudeBin(table.magnitude[i] as number);
      const r = distanceBinOf(rrupKm[k] as number);
      contribution[at] = c;
      epsilonOf[at] = epsilon;
      magnitudeBinOf[at] = m;
      distanceBinOfPair[at] = r;
      if (epsilon < minEpsilon) minEpsilon = epsilon;
      if (epsilon > maxEpsilon) maxEpsilon = epsilon;
      if (m < minM) minM = m;
      if (m > maxM) maxM = m;
      if (r > maxR) maxR = r;
    }
  }
  if (minM > maxM) return null;

  const distanceBins = maxR + 1;
  const binCount = (maxM - minM + 1) * distanceBins * EPSILON_BINS;
  const binSums = createLevelAccumulator(binCount * SLOTS);
  const overall = createLevelAccumulator(SLOTS);
  const sourceSums = createLevelAccumulator(table.sourceIds.length);
  const sourceSeen = new Uint8Array(table.sourceIds.length);
  at = 0;
  for (const { ruptureIndex, rrupKm } of branches) {
    for (let k = 0; k < ruptureIndex.length; k++, at++) {
      const c = contribution[at] as number;
      if (!(c > 0)) continue;
      const i = ruptureIndex[k] as number;
      const epsilon = epsilonOf[at] as number;
      const magnitude = table.magnitude[i] as number;
      const distanceKm = rrupKm[k] as number;
      const bin =
        (((magnitudeBinOf[at] as number) - minM) * distanceBins +
          (distanceBinOfPair[at] as number)) *
          EPSILON_BINS +
        epsilonBin(epsilon);
      const slot = bin * SLOTS;
      accumulate(binSums, slot, c);
      accumulate(binSums, slot + 1, c * magnitude);
      accumulate(binSums, slot + 2, c * distanceKm);
      accumulate(binSums, slot + 3, c * epsilon);
      accumulate(overall, 0, c);
      accumulate(overall, 1, c * magnitude);
      accumulate(overall, 2, c * distanceKm);
      accumulate(overall, 3, c * epsilon);
      const source = table.sourceIndex[i] as number;
      sourceSeen[source] = 1;
      accumulate(sourceSums, source, c);
    }
  }

  const total = accumulatedTotal(overall, 0);
  if (!(total > 0)) return null;
  const mean = (slot: number): number => accumulatedTotal(overall, slot) / total;

  const totalAt = (slot: number): number => accumulatedTotal(binSums, slot);
  const filled: number[] = [];
  for (let bin = 0; bin < binCount; bin++)
    if ((binSums.sum[bin * SLOTS] as number) > 0) filled.push(bin);
  const shareSum = compensatedSum(filled.map((bin) => totalAt(bin * SLOTS)));
  // The first of equal largest bins, in the listed order, so the mode is deterministic (as deaggregation.ts).
  let modal = filled[0] as number;
  for (const bin of filled) if (totalAt(bin * SLOTS) > totalAt(modal * SLOTS)) modal = bin;
  const modalRate = totalAt(modal * SLOTS);
  const resultBins: DeaggregationBin[] = filled.map((bin) => {
    const e = bin % EPSILON_BINS;
    const r = ((bin - e) / EPSILON_BINS) % distanceBins;
    const m = minM + (bin - e - r * EPSILON_BINS) / (EPSILON_BINS * distanceBins);
    return {
      magnitude: magnitudeBinRange(m),
      distanceKm: distanceBinRange(r),
      epsilon: epsilonBinRange(e, minEpsilon, maxEpsilon),
      share: totalAt(bin * SLOTS) / shareSum,
    };
  });

  const sources: SourceContribution[] = [];
  sourceSeen.forEach((seen, sourceIndex) => {
    if (!seen) return;
    const sourceId = table.sourceIds[sourceIndex] as string;
    sources.push({
      sourceId,
      name: options.sourceNames[sourceIndex] ?? sourceId,
      rate: accumulatedTotal(sourceSums, sourceIndex),
    });
  });

  return {
    measure: options.measure,
    level: options.level,
    returnPeriodYears: options.returnPeriodYears,
    bySource: sourceShares(sources),
    mean: { magnitude: mean(1), distanceKm: mean(2), epsilon: mean(3) },
    mode: {
      magnitude: totalAt(modal * SLOTS + 1) / modalRate,
      distanceKm: totalAt(modal * SLOTS + 2) / modalRate,
      epsilon: totalAt(modal * SLOTS + 3) / modalRate,
    },
    bins: resultBins,
  };
}
