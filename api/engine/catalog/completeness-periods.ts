import { InvalidInput } from '../errors.ts';
import type { CatalogEvent } from './event.ts';
import { MS_PER_YEAR } from './event.ts';
import { binIndex, binMagnitude, checkMagnitudeStep } from './magnitude-bins.ts';

/**
 * A completeness period: every event with magnitude (bin centre) at or above `magnitude` was
 * recorded from `startMs` to the end of the catalog. A catalog usually has several, larger
 * magnitudes complete for longer.
 */
export interface CompletenessPeriod {
  readonly magnitude: number;
  /** UTC epoch ms. */
  readonly startMs: number;
}

/** One magnitude bin with its count and the years it was observed completely. */
export interface ObservationBin {
  /** Bin centre. */
  readonly magnitude: number;
  readonly count: number;
  readonly years: number;
}

export interface ObservationBinsOptions {
  readonly periods: readonly CompletenessPeriod[];
  /** End of the catalog, UTC epoch ms. */
  readonly endMs: number;
  readonly magnitudeStep: number;
  /**
   * Highest bin centre to include (with zero counts above the largest event). Default: the bin
   * of the largest event.
   */
  readonly upperMagnitude?: number;
}

/**
 * Counts and observation years per bin from the lowest period magnitude upwards. A bin is
 * observed from the earliest start among the periods whose magnitude it reaches; events before
 * that start or after endMs are not counted.
 */
export function observationBins(
  events: readonly CatalogEvent[],
  options: ObservationBinsOptions,
): ObservationBin[] {
  const { periods, endMs, magnitudeStep: step } = options;
  checkMagnitudeStep(step);
  if (periods.length === 0)
    throw new InvalidInput([
      { path: 'periods', message: 'expected at least one completeness period' },
    ]);
  periods.forEach((p, i) => {
    if (!Number.isFinite(p.magnitude))
      throw new InvalidInput([
        {
          path: `periods[${i}].magnitude`,
          message: `expected a finite magnitude; got ${p.magnitude}`,
        },
      ]);
    if (!(Number.isFinite(p.startMs) && p.startMs < endMs)) {
      throw new InvalidInput([
        {
          path: `periods[${i}].startMs`,
          message: `expected a start before the catalog end ${new Date(endMs).toISOString()}; got ${p.startMs}`,
        },
      ]);
    }
  });
  const periodIndex = periods.map((p) => binIndex(p.magnitude, step));
  const lo = Math.min(...periodIndex);
  const startOf = (k: number): number => {
    let start = Infinity;
    periods.forEach((p, i) => {
      if ((periodIndex[i] as number) <= k && p.startMs < start) start = p.startMs;
    });
    return start;
  };
  const counts = new Map<number, number>();
  let hi = lo;
  for (const e of events) {
    const k = binIndex(e.magnitude, step);
    if (k < lo || e.timeMs > endMs || e.timeMs < startOf(k)) continue;
    counts.set(k, (counts.get(k) ?? 0) + 1);
    if (k > hi) hi = k;
  }
  if (options.upperMagnitude !== undefined)
    hi = Math.max(hi, binIndex(options.upperMagnitude, step));
  const bins: ObservationBin[] = [];
  for (let k = lo; k <= hi; k++) {
    bins.push({
      magnitude: binMagnitude(k, step),
      count: counts.get(k) ?? 0,
      years: (endMs - startOf(k)) / MS_PER_YEAR,
    });
  }
  return bins;
}
