import { InvalidInput } from '../errors.ts';
import { compensatedSum } from '../summation.ts';
import { akiUtsuBValue, type BValueEstimate } from './aki-utsu.ts';
import { yearsBetween, type CatalogEvent } from './event.ts';
import { observationBins, type CompletenessPeriod } from './completeness-periods.ts';
import { selectByMagnitudeType, type MagnitudeSelectionOptions } from './magnitude-type.ts';
import { weichertFit } from './weichert.ts';

/**
 * A Gutenberg–Richter line, log10 N(M >= m) = aValue − bValue m per year, fitted to a catalog
 * complete above one magnitude over one observation span: b by Aki–Utsu (aki-utsu.ts), the
 * annual rate from the count. Binned magnitudes from the bin centred on Mc stand for true
 * magnitudes from Mc − ΔM/2 (Utsu 1965), so the count n over T years is the rate at that
 * reference magnitude m0 and aValue = log10(n / T) + b m0.
 */
export interface GutenbergRichterFit extends BValueEstimate {
  readonly method: 'aki-utsu' | 'weichert';
  readonly aValue: number;
  /** The magnitude the rate is counted from: Mc − ΔM/2. */
  readonly referenceMagnitude: number;
  /** Annual rate of M >= referenceMagnitude. */
  readonly rateAtReference: number;
  /** Poisson standard error of that rate, sqrt(n) / T (counting only; b's error not included). */
  readonly sigmaRate: number;
  readonly observationYears: number;
  /** Events left out for their magnitude type (see MagnitudeSelectionOptions). */
  readonly excludedNonMoment: number;
  readonly notes: readonly string[];
}

export interface GutenbergRichterFitOptions extends MagnitudeSelectionOptions {
  /** Completeness magnitude, a bin centre when magnitudeStep > 0. */
  readonly mc: number;
  /** Bin width of the reported magnitudes; default 0.1, 0 for unbinned. */
  readonly magnitudeStep?: number;
  /** Observation span, UTC epoch ms; defaults to the first and last event of the selection. */
  readonly startMs?: number;
  readonly endMs?: number;
}

/** Aki–Utsu b, Shi & Bolt σb and the annual rate (per year) for a catalog complete above `mc`. */
export function fitGutenbergRichter(
  events: readonly CatalogEvent[],
  options: GutenbergRichterFitOptions,
): GutenbergRichterFit {
  const step = options.magnitudeStep ?? 0.1;
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const span = observationSpan(selected.events, options.startMs, options.endMs);
  const inSpan = selected.events.filter((e) => e.timeMs >= span.startMs && e.timeMs <= span.endMs);
  const estimate = akiUtsuBValue(
    inSpan.map((e) => e.magnitude),
    options.mc,
    step,
  );
  const years = yearsBetween(span.startMs, span.endMs);
  const referenceMagnitude = estimate.mc - step / 2;
  const rateAtReference = estimate.eventCount / years;
  return {
    ...estimate,
    method: 'aki-utsu',
    aValue: Math.log10(rateAtReference) + estimate.bValue * referenceMagnitude,
    referenceMagnitude,
    rateAtReference,
    sigmaRate: Math.sqrt(estimate.eventCount) / years,
    observationYears: years,
    excludedNonMoment: selected.excludedNonMoment,
    notes: span.notes,
  };
}

/** Annual rate of M >= magnitude on the fitted (untruncated) line. */
export const annualRateAbove = (
  fit: Pick<GutenbergRichterFit, 'aValue' | 'bValue'>,
  magnitude: number,
): number => 10 ** (fit.aValue - fit.bValue * magnitude);

/**
 * Annual rate of M >= magnitude when the same events are read as a Gutenberg–Richter
 * distribution truncated at mMax: the rate at the reference magnitude is kept and the
 * distribution renormalised between it and mMax (Cornell & Vanmarcke 1969, from memory).
 * Zero at and above mMax; below the reference magnitude it extrapolates the line.
 */
export function truncatedRateAbove(
  fit: Pick<GutenbergRichterFit, 'bValue' | 'referenceMagnitude' | 'rateAtReference'>,
  magnitude: number,
  mMax: number,
): number {
  if (!(mMax > fit.referenceMagnitude)) {
    throw new InvalidInput([
      {
        path: 'mMax',
        message: `expected mMax above the reference magnitude ${fit.referenceMagnitude}; got ${mMax}`,
      },
    ]);
  }
  if (magnitude >= mMax) return 0;
  const tail = 10 ** (-fit.bValue * (mMax - fit.referenceMagnitude));
  return (
    (fit.rateAtReference * (10 ** (-fit.bValue * (magnitude - fit.referenceMagnitude)) - tail)) /
    (1 - tail)
  );
}

/**
 * The observation span: as given, or from the first to the last event (which shortens it by
 * about one interval between events, so the note says so).
 */
export function observationSpan(
  events: readonly CatalogEvent[],
  startMs: number | undefined,
  endMs: number | undefined,
): { readonly startMs: number; readonly endMs: number; readonly notes: string[] } {
  const notes: string[] = [];
  let start = startMs;
  let end = endMs;
  if (start === undefined || end === undefined) {
    if (events.length === 0)
      throw new InvalidInput([
        {
          path: 'events',
          message: 'expected at least one event to take the observation span from',
        },
      ]);
    let first = Infinity;
    let last = -Infinity;
    for (const e of events) {
      if (e.timeMs < first) first = e.timeMs;
      if (e.timeMs > last) last = e.timeMs;
    }
    start ??= first;
    end ??= last;
    notes.push(
      `observation ${startMs === undefined ? (endMs === undefined ? 'start and end' : 'start') : 'end'} taken from the events, which shortens the span; give startMs and endMs for the catalog's real span`,
    );
  }
  if (!(Number.isFinite(start) && Number.isFinite(end) && end > start)) {
    throw new InvalidInput([
      {
        path: 'endMs',
        message: `expected an observation span with endMs after startMs; got ${start} to ${end}`,
      },
    ]);
  }
  return { startMs: start, endMs: end, notes };
}

export interface WeichertCatalogFitOptions extends MagnitudeSelectionOptions {
  readonly periods: readonly CompletenessPeriod[];
  /** End of the catalog, UTC epoch ms; defaults to the last event of the selection. */
  readonly endMs?: number;
  /** Default 0.1. */
  readonly magnitudeStep?: number;
  /** Highest bin centre in the fit (zero counts above the largest event); default that event's bin. */
  readonly upperMagnitude?: number;
}

/** A Gutenberg–Richter line by Weichert (1980) over completeness periods (weichert.ts). */
export function fitGutenbergRichterWeichert(
  events: readonly CatalogEvent[],
  options: WeichertCatalogFitOptions,
): GutenbergRichterFit {
  const step = options.magnitudeStep ?? 0.1;
  if (options.periods.length === 0)
    throw new InvalidInput([
      { path: 'periods', message: 'expected at least one completeness period' },
    ]);
  const selected = selectByMagnitudeType(events, options.magnitudes);
  const earliest = Math.min(...options.periods.map((p) => p.startMs));
  const span = observationSpan(selected.events, earliest, options.endMs);
  const bins = observationBins(selected.events, {
    periods: options.periods,
    endMs: span.endMs,
    magnitudeStep: step,
    ...(options.upperMagnitude === undefined ? {} : { upperMagnitude: options.upperMagnitude }),
  });
  const fit = weichertFit(bins, { magnitudeStep: step });
  const counted = compensatedSum(bins.map((b) => b.count * b.magnitude));
  return {
    method: 'weichert',
    bValue: fit.bValue,
    sigmaB: fit.sigmaB,
    eventCount: fit.eventCount,
    meanMagnitude: counted / fit.eventCount,
    mc: fit.referenceMagnitude + step / 2,
    magnitudeStep: step,
    aValue: fit.aValue,
    referenceMagnitude: fit.referenceMagnitude,
    rateAtReference: fit.rateAtReference,
    sigmaRate: fit.sigmaRate,
    observationYears: yearsBetween(earliest, span.endMs),
    excludedNonMoment: selected.excludedNonMoment,
    notes: span.notes,
  };
}
