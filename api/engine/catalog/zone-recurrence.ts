import { InvalidInput } from '../errors.ts';
import type { GutenbergRichterRecurrence, LonLat } from '../model.ts';
import type { CompletenessPeriod } from './completeness-periods.ts';
import type { CatalogEvent } from './event.ts';
import {
  fitGutenbergRichter,
  fitGutenbergRichterWeichert,
  truncatedRateAbove,
  type GutenbergRichterFit,
} from './gutenberg-richter-fit.ts';
import type { MagnitudeSelectionOptions } from './magnitude-type.ts';
import { insideZone, zonePolygon } from './zone-polygon.ts';

/** A zone's recurrence fitted from its catalog, with the uncertainty that goes with it. */
export interface ZoneRecurrence {
  /** Ready for a zone source: `rate` is the annual rate of M >= mMin. */
  readonly recurrence: GutenbergRichterRecurrence;
  readonly bValue: number;
  /** Shi & Bolt (1982) for Aki–Utsu, Weichert (1980) for completeness periods. */
  readonly sigmaB: number;
  readonly rate: number;
  /** Poisson standard error of `rate` from the event count (rate / sqrt(n)); b's error not included. */
  readonly sigmaRate: number;
  readonly eventCount: number;
  /** Events inside the zone (and depth range) before the completeness and magnitude-type cuts. */
  readonly eventsInZone: number;
  readonly fit: GutenbergRichterFit;
  /** Plain statement of the estimate, e.g. "b = 1.02 ± 0.07; 0.031 ± 0.004 events a year of M 5.0 or more". */
  readonly summary: string;
  readonly notes: readonly string[];
}

export type ZoneCompleteness =
  /** One completeness magnitude over one span: Aki–Utsu with Utsu's correction. */
  | { readonly mc: number; readonly startMs?: number; readonly endMs?: number }
  /** Completeness periods: Weichert (1980). */
  | { readonly periods: readonly CompletenessPeriod[]; readonly endMs?: number };

export interface ZoneRecurrenceOptions extends MagnitudeSelectionOptions {
  /** Zone outline: outer ring, then holes; WGS84 [lon, lat]. */
  readonly rings: readonly (readonly LonLat[])[];
  readonly completeness: ZoneCompleteness;
  /** Largest magnitude the zone can host (an input: a catalog cannot tell it). */
  readonly mMax: number;
  /** Smallest magnitude of the recurrence; default the fit's reference magnitude (Mc − ΔM/2). */
  readonly mMin?: number;
  /** Default 0.1. */
  readonly magnitudeStep?: number;
  /** Keep only events with depth in [min, max] km (events without a depth are then left out). */
  readonly depthKm?: readonly [min: number, max: number];
}

/**
 * A `gutenberg-richter` recurrence for a zone from the (declustered) events inside it. The
 * b-value comes from Aki–Utsu or Weichert; the rate of M >= mMin reads the fitted distribution
 * as truncated at mMax with the observed rate at the reference magnitude kept
 * (truncatedRateAbove), and carries the count's relative Poisson error 1/sqrt(n).
 */
export function zoneRecurrence(
  events: readonly CatalogEvent[],
  options: ZoneRecurrenceOptions,
): ZoneRecurrence {
  const step = options.magnitudeStep ?? 0.1;
  const zone = zonePolygon(options.rings);
  const window = options.depthKm;
  const inDepth = (depthKm: number | null) =>
    window === undefined || (depthKm !== null && depthKm >= window[0] && depthKm <= window[1]);
  const inZone = events.filter((e) => inDepth(e.depthKm) && insideZone(zone, e.lon, e.lat));
  const c = options.completeness;
  const common = {
    magnitudeStep: step,
    ...(options.magnitudes ? { magnitudes: options.magnitudes } : {}),
  };
  const fit =
    'periods' in c
      ? fitGutenbergRichterWeichert(inZone, {
          ...common,
          periods: c.periods,
          upperMagnitude: options.mMax,
          ...(c.endMs === undefined ? {} : { endMs: c.endMs }),
        })
      : fitGutenbergRichter(inZone, {
          ...common,
          mc: c.mc,
          ...(c.startMs === undefined ? {} : { startMs: c.startMs }),
          ...(c.endMs === undefined ? {} : { endMs: c.endMs }),
        });
  const mMin = options.mMin ?? fit.referenceMagnitude;
  if (!(Number.isFinite(options.mMax) && options.mMax > mMin)) {
    throw new InvalidInput([
      { path: 'mMax', message: `expected mMax greater than mMin ${mMin}; got ${options.mMax}` },
    ]);
  }
  const rate = truncatedRateAbove(fit, mMin, options.mMax);
  const sigmaRate = rate / Math.sqrt(fit.eventCount);
  const notes = [...fit.notes];
  const left = fit.excludedNonMoment;
  if (left > 0)
    notes.push(
      `${left} event${left === 1 ? ' in the zone was' : 's in the zone were'} left out: not moment magnitudes`,
    );
  if (mMin < fit.referenceMagnitude - 1e-9)
    notes.push(
      `mMin ${mMin} is below the completeness magnitude: the rate there extrapolates the fitted line`,
    );
  return {
    recurrence: { type: 'gutenberg-richter', bValue: fit.bValue, mMin, mMax: options.mMax, rate },
    bValue: fit.bValue,
    sigmaB: fit.sigmaB,
    rate,
    sigmaRate,
    eventCount: fit.eventCount,
    eventsInZone: inZone.length,
    fit,
    summary: `b = ${fit.bValue.toFixed(2)} ± ${fit.sigmaB.toFixed(2)}; ${significant(rate)} ± ${significant(sigmaRate)} events a year of M ${mMin.toFixed(2)} or more (from ${fit.eventCount} events, ${fit.method})`,
    notes,
  };
}

const significant = (x: number): string => x.toPrecision(2);
