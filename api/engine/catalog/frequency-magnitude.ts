import { InvalidInput } from '../errors.ts';
import type { CompletenessPeriod } from './completeness-periods.ts';
import { yearsBetween, type CatalogEvent } from './event.ts';
import { binIndex, binMagnitude, checkMagnitudeStep } from './magnitude-bins.ts';
import { selectByMagnitudeType, type MagnitudeSelectionOptions } from './magnitude-type.ts';

/** One bin of a frequency–magnitude distribution, for a plot. */
export interface FrequencyMagnitudeBin {
  /** Bin centre. */
  readonly magnitude: number;
  /** Lower edge, magnitude − step/2: the magnitude the cumulative values count from. */
  readonly lowerEdge: number;
  readonly count: number;
  /** Events in this bin and every bin above it. */
  readonly cumulativeCount: number;
  /** Years this bin was observed (all bins alike without completeness periods). */
  readonly years: number;
  readonly annualRate: number;
  /** Sum of the annual rates of this bin and every bin above it: the rate of M >= lowerEdge. */
  readonly cumulativeAnnualRate: number;
  /** The fitted line at lowerEdge, 10^(a − b lowerEdge), when a fit is given. */
  readonly fittedCumulativeAnnualRate?: number;
}

export interface FrequencyMagnitude {
  readonly bins: readonly FrequencyMagnitudeBin[];
  /** The fitted line's end points over the bins at or above its reference magnitude. */
  readonly fittedLine?: readonly {
    readonly magnitude: number;
    readonly cumulativeAnnualRate: number;
  }[];
  readonly excludedNonMoment: number;
}

export interface FrequencyMagnitudeOptions extends MagnitudeSelectionOptions {
  /** Default 0.1. */
  readonly magnitudeStep?: number;
  /** Observation span, UTC epoch ms (required: a plot's rates are only as good as its span). */
  readonly startMs: number;
  readonly endMs: number;
  /** With periods, each bin's rate uses its own observed years and earlier events are not counted. */
  readonly periods?: readonly CompletenessPeriod[];
  /** A fitted line, log10 N(M >= m) = aValue − bValue m, and the magnitude it applies from. */
  readonly fit?: {
    readonly aValue: number;
    readonly bValue: number;
    readonly referenceMagnitude: number;
  };
}

/**
 * Incremental and cumulative counts and annual rates per magnitude bin, every bin from the
 * lowest to the highest occupied one, with the fitted line beside them.
 */
export function frequencyMagnitude(
  events: readonly CatalogEvent[],
  options: FrequencyMagnitudeOptions,
): FrequencyMagnitude {
  const step = options.magnitudeStep ?? 0.1;
  checkMagnitudeStep(step);
  const { startMs, endMs } = options;
  if (!(Number.isFinite(startMs) && Number.isFinite(endMs) && endMs > startMs)) {
    throw new InvalidInput([
      {
        path: 'endMs',
        message: `expected an observation span with endMs after startMs; got ${startMs} to ${endMs}`,
      },
    ]);
  }
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const periods = options.periods ?? [];
  // With periods a bin is observed from its period's start, as the Weichert fit counts it
  // (completeness-periods.ts observationBins), even before the first event: rates plotted from
  // a later start would sit above the line fitted through them.
  const startOf = (k: number): number => {
    if (periods.length === 0) return startMs;
    let start = Infinity;
    for (const p of periods)
      if (binIndex(p.magnitude, step) <= k && p.startMs < start) start = p.startMs;
    return start;
  };
  const counts = new Map<number, number>();
  for (const e of selected.events) {
    const k = binIndex(e.magnitude, step);
    if (e.timeMs > endMs || e.timeMs < startOf(k)) continue;
    counts.set(k, (counts.get(k) ?? 0) + 1);
  }
  if (counts.size === 0) return { bins: [], excludedNonMoment: selected.excludedNonMoment };
  const keys = [...counts.keys()];
  const lo = Math.min(...keys);
  const hi = Math.max(...keys);
  const rows: { k: number; count: number; years: number }[] = [];
  for (let k = lo; k <= hi; k++) {
    const start = startOf(k);
    rows.push({
      k,
      count: counts.get(k) ?? 0,
      years: Number.isFinite(start) ? yearsBetween(start, endMs) : 0,
    });
  }
  let cumulativeCount = 0;
  let cumulativeRate = 0;
  const bins: FrequencyMagnitudeBin[] = [];
  for (let r = rows.length - 1; r >= 0; r--) {
    const { k, count, years } = rows[r] as { k: number; count: number; years: number };
    const annualRate = years > 0 ? count / years : 0;
    cumulativeCount += count;
    cumulativeRate += annualRate;
    const magnitude = binMagnitude(k, step);
    const lowerEdge = Math.round((magnitude - step / 2) * 1e9) / 1e9;
    const fitted =
      options.fit && lowerEdge >= options.fit.referenceMagnitude - 1e-9
        ? 10 ** (options.fit.aValue - options.fit.bValue * lowerEdge)
        : undefined;
    bins.push({
      magnitude,
      lowerEdge,
      count,
      cumulativeCount,
      years,
      annualRate,
      cumulativeAnnualRate: cumulativeRate,
      ...(fitted === undefined ? {} : { fittedCumulativeAnnualRate: fitted }),
    });
  }
  bins.reverse();
  const fit = options.fit;
  const fittedEdges = bins
    .filter((b) => b.fittedCumulativeAnnualRate !== undefined)
    .map((b) => b.lowerEdge);
  if (!fit || fittedEdges.length === 0)
    return { bins, excludedNonMoment: selected.excludedNonMoment };
  const line = (m: number) => ({
    magnitude: m,
    cumulativeAnnualRate: 10 ** (fit.aValue - fit.bValue * m),
  });
  const from = fittedEdges[0] as number;
  const to = (fittedEdges[fittedEdges.length - 1] as number) + step;
  return {
    bins,
    fittedLine: [line(from), line(to)],
    excludedNonMoment: selected.excludedNonMoment,
  };
}
