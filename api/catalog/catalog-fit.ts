import {
  completenessOverTime,
  maxCurvatureMc,
  type CompletenessWindow,
} from '../engine/catalog/completeness.ts';
import type { CompletenessPeriod } from '../engine/catalog/completeness-periods.ts';
import type { CatalogEvent } from '../engine/catalog/event.ts';
import {
  frequencyMagnitude,
  type FrequencyMagnitude,
} from '../engine/catalog/frequency-magnitude.ts';
import {
  declusterGardnerKnopoff,
  type DeclusteredCatalog,
} from '../engine/catalog/gardner-knopoff.ts';
import {
  fitGutenbergRichter,
  fitGutenbergRichterWeichert,
  observationSpan,
  type GutenbergRichterFit,
} from '../engine/catalog/gutenberg-richter-fit.ts';
import {
  convertMagnitudes,
  type MagnitudeConversion,
} from '../engine/catalog/magnitude-conversion.ts';
import {
  selectByMagnitudeType,
  type MagnitudeSelection,
} from '../engine/catalog/magnitude-type.ts';
import { insideZone, zonePolygon } from '../engine/catalog/zone-polygon.ts';
import { zoneRecurrence, type ZoneRecurrence } from '../engine/catalog/zone-recurrence.ts';
import {
  bOutsideUsual,
  completenessChanges,
  largeMagnitudesDisagree,
  mostRemoved,
  USUAL_B_RANGE,
  type FitFinding,
} from '../engine/catalog/fit-checks.ts';
import { InvalidInput } from '../engine/errors.ts';
import type { LonLat } from '../engine/model.ts';

/**
 * A catalog turned into recurrence, in the order the methods need: magnitude types chosen,
 * Gardner & Knopoff (1974) declustering of the whole catalog (so aftershocks of a mainshock
 * just outside the zone do not count as independent events inside it), then the zone's
 * events, Mc, the fits, the recurrence and the frequency–magnitude data for a plot. Every
 * number comes from api/engine/catalog/; this file only chains the steps and keeps what each
 * found.
 */
export interface CatalogFit {
  readonly magnitudes: MagnitudeSelection;
  /** Conversions to moment magnitude the user chose: events converted and left outside each relation's range, by relation id. */
  readonly conversion?: Pick<MagnitudeConversion, 'converted' | 'outsideRange'>;
  readonly excludedNonMoment: number;
  /** Undefined when declustering was turned off. */
  readonly declustering?: DeclusteredCatalog;
  readonly zone: {
    readonly given: boolean;
    readonly eventsInZone: number;
    readonly eventsOutside: number;
  };
  readonly observation: {
    readonly startMs: number;
    readonly endMs: number;
    readonly years: number;
  };
  readonly completeness: {
    readonly method: 'max-curvature' | 'fixed';
    readonly mc: number;
    /** Maximum curvature: the most populated bin and the correction added to it. */
    readonly peakMagnitude?: number;
    readonly correction?: number;
    /** When periods were proposed: Mc in each time window. */
    readonly windows?: readonly CompletenessWindow[];
  };
  readonly akiUtsu: GutenbergRichterFit;
  /** With completeness periods. */
  readonly weichert?: GutenbergRichterFit;
  readonly periods?: readonly CompletenessPeriod[];
  /** With mMax: ready for a zone source, from Weichert when there are periods, else Aki–Utsu. */
  readonly recurrence?: ZoneRecurrence;
  readonly frequencyMagnitude: FrequencyMagnitude;
  /** Reasons to distrust the fit (fit-checks.ts), each with what to do; read them before using the recurrence. */
  readonly warnings: readonly string[];
  readonly notes: readonly string[];
}

/** How the caller names the options a note or warning points to (the service's keys by default). */
export interface FitOptionNames {
  readonly span: string;
  readonly mMax: string;
  readonly periods: string;
  readonly decluster: string;
}

export const SERVICE_OPTION_NAMES: FitOptionNames = {
  span: 'startTime and endTime',
  mMax: 'mMax',
  periods: 'completeness.periods ("proposed" or your own)',
  decluster: 'decluster: false',
};

/**
 * Without a polygon every event counts: the zone is the whole globe as one ring (in GeoJSON's
 * longitude–latitude plane, where it holds every epicentre, its boundary included).
 */
const WHOLE_GLOBE: readonly (readonly LonLat[])[] = [
  [
    [-180, -90],
    [180, -90],
    [180, 90],
    [-180, 90],
    [-180, -90],
  ],
];

const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;

export interface CatalogFitOptions {
  /** Zone outline, outer ring then holes, WGS84 [lon, lat]; default every event. */
  readonly rings?: readonly (readonly LonLat[])[];
  /** Largest magnitude the zone can host; without it no recurrence is built. */
  readonly mMax?: number;
  /** Default true. */
  readonly decluster?: boolean;
  /** Default 'moment'. */
  readonly magnitudes?: MagnitudeSelection;
  /**
   * Relations (ids from engine/catalog/magnitude-conversion.ts) converting ML, mb or Ms events
   * to moment magnitude before the selection; default none, so other magnitudes are left out.
   */
  readonly conversions?: readonly string[];
  /** Bin width of the reported magnitudes; default 0.1. */
  readonly magnitudeStep?: number;
  /** A completeness magnitude (bin centre); default maximum curvature of the zone's events. */
  readonly mc?: number;
  /** Added to the maximum-curvature peak; default 0.2 (Woessner & Wiemer 2005). */
  readonly mcCorrection?: number;
  /**
   * Completeness periods for a Weichert (1980) fit beside Aki–Utsu, or 'proposed' to take them
   * from Mc over time windows (completenessOverTime). The recurrence then uses Weichert.
   */
  readonly periods?: readonly CompletenessPeriod[] | 'proposed';
  /** Events per time window when periods are proposed; default 100. */
  readonly eventsPerWindow?: number;
  /** Observation span, UTC epoch ms; default the first and last event fitted. */
  readonly startMs?: number;
  readonly endMs?: number;
  /** Names of the options in notes and warnings; default SERVICE_OPTION_NAMES. */
  readonly optionNames?: FitOptionNames;
}

/** Declustering, Mc, Aki–Utsu (and Weichert), recurrence and frequency–magnitude of a catalog. */
export function fitCatalog(
  events: readonly CatalogEvent[],
  options: CatalogFitOptions = {},
): CatalogFit {
  const step = options.magnitudeStep ?? 0.1;
  const magnitudes = options.magnitudes ?? 'moment';
  const names = options.optionNames ?? SERVICE_OPTION_NAMES;
  const notes: string[] = [];
  const conversion =
    options.conversions && options.conversions.length > 0
      ? convertMagnitudes(events, options.conversions)
      : undefined;
  const selected = selectByMagnitudeType(conversion?.events ?? events, magnitudes);
  if (selected.events.length === 0) {
    throw new InvalidInput([
      {
        path: 'magnitudes',
        message: `expected moment magnitudes; none of the ${plural(events.length, 'event')} has one. Ask for all magnitudes to fit them as they are`,
      },
    ]);
  }
  const declustering =
    options.decluster === false
      ? undefined
      : declusterGardnerKnopoff(selected.events, { magnitudes: 'all' });
  const kept = declustering?.mainshocks ?? selected.events;

  const rings = options.rings ?? WHOLE_GLOBE;
  const zone = zonePolygon(rings, 'polygon');
  const fitted = kept.filter((e) => insideZone(zone, e.lon, e.lat));
  if (fitted.length === 0) {
    throw new InvalidInput([
      {
        path: 'polygon',
        message: `expected events inside the zone polygon; all ${plural(kept.length, 'event')} fall outside it`,
      },
    ]);
  }
  if (
    options.startMs === undefined &&
    fitted.every((e) => e.timeMs === (fitted[0] as CatalogEvent).timeMs)
  ) {
    throw new InvalidInput([
      {
        path: 'startTime',
        message: `expected events at two or more times to measure the observation span from, or startTime and endTime; every event fitted is at ${new Date((fitted[0] as CatalogEvent).timeMs).toISOString()}`,
      },
    ]);
  }
  const span = observationSpan(fitted, options.startMs, options.endMs);
  if (span.notes.length > 0) {
    notes.push(
      `the observation span runs from the first to the last event fitted, which shortens it by about one gap between events and so raises the rates; give the catalog's real span (${names.span})`,
    );
  }
  const inSpan = fitted.filter((e) => e.timeMs >= span.startMs && e.timeMs <= span.endMs);
  if (inSpan.length === 0) {
    throw new InvalidInput([
      {
        path: 'startTime',
        message: `expected events within the observation span; none of the ${plural(fitted.length, 'event')} fitted falls in it`,
      },
    ]);
  }
  const correction = options.mcCorrection ?? 0.2;
  const curvature =
    options.mc === undefined
      ? maxCurvatureMc(
          inSpan.map((e) => e.magnitude),
          { magnitudeStep: step, correction },
        )
      : undefined;
  const mc = options.mc ?? (curvature?.mc as number);
  const common = { magnitudeStep: step, magnitudes: 'all' } as const;
  const akiUtsu = fitGutenbergRichter(fitted, {
    ...common,
    mc,
    startMs: span.startMs,
    endMs: span.endMs,
  });

  const perWindow = options.eventsPerWindow ?? 100;
  if (options.periods === 'proposed' && inSpan.length < perWindow) {
    throw new InvalidInput([
      {
        path: 'completeness.eventsPerWindow',
        message: `expected at most ${inSpan.length} events per window (the events fitted) to propose completeness periods; got ${perWindow}`,
      },
    ]);
  }
  if (Array.isArray(options.periods)) {
    options.periods.forEach((p, i) => {
      if (!(p.startMs < span.endMs)) {
        throw new InvalidInput([
          {
            path: `completeness.periods[${i}].start`,
            message: `expected a start before the end of the observation span, ${new Date(span.endMs).toISOString()}; got ${new Date(p.startMs).toISOString()}`,
          },
        ]);
      }
    });
  }
  const overTime =
    options.periods === 'proposed'
      ? completenessOverTime(inSpan, { ...common, correction, eventsPerWindow: perWindow })
      : undefined;
  const periods =
    overTime?.periods ?? (options.periods === 'proposed' ? undefined : options.periods);
  const upper = options.mMax === undefined ? {} : { upperMagnitude: options.mMax };
  const weichert = periods
    ? fitGutenbergRichterWeichert(fitted, { ...common, ...upper, periods, endMs: span.endMs })
    : undefined;
  const chosen = weichert ?? akiUtsu;

  let recurrence: ZoneRecurrence | undefined;
  if (options.mMax === undefined)
    notes.push(
      `no recurrence: give the largest magnitude the zone can host (${names.mMax}), which a catalog cannot tell`,
    );
  else {
    if (weichert)
      notes.push(
        `the Weichert (1980) fit counts every magnitude bin up to ${names.mMax} ${options.mMax}, the empty ones too, so ${names.mMax} changes its b-value`,
      );
    recurrence = zoneRecurrence(fitted, {
      ...common,
      rings,
      mMax: options.mMax,
      // Mc − ΔM/2, a bin edge, rounded to 1e-9 as bin centres are: the recurrence to paste reads 4.15, not 4.1499999999999995.
      mMin: Math.round(chosen.referenceMagnitude * 1e9) / 1e9,
      completeness: periods
        ? { periods, endMs: span.endMs }
        : { mc, startMs: span.startMs, endMs: span.endMs },
    });
    notes.push(...recurrence.notes);
  }
  const plot = frequencyMagnitude(fitted, {
    ...common,
    startMs: span.startMs,
    endMs: span.endMs,
    ...(periods ? { periods } : {}),
    fit: {
      aValue: chosen.aValue,
      bValue: chosen.bValue,
      referenceMagnitude: chosen.referenceMagnitude,
    },
  });
  const inSpanMagnitudes = inSpan
    .filter((e) => e.magnitude >= chosen.referenceMagnitude - 1e-9)
    .map((e) => e.magnitude);
  const windows =
    overTime?.windows ??
    (periods === undefined && inSpan.length >= 2 * perWindow
      ? completenessOverTime(inSpan, { ...common, correction, eventsPerWindow: perWindow }).windows
      : undefined);
  const findings = [
    bOutsideUsual(chosen.bValue),
    inSpanMagnitudes.length > 0
      ? largeMagnitudesDisagree({
          magnitudes: inSpanMagnitudes,
          aValue: chosen.aValue,
          bValue: chosen.bValue,
          referenceMagnitude: chosen.referenceMagnitude,
          observationYears: chosen.observationYears,
          magnitudeStep: step,
        })
      : undefined,
    periods === undefined && windows ? completenessChanges(windows, mc) : undefined,
    declustering ? mostRemoved(declustering.removed.length, selected.events.length) : undefined,
  ].filter((f): f is FitFinding => f !== undefined);
  return {
    warnings: findings.map((f) => findingText(f, names, chosen.observationYears)),
    magnitudes,
    ...(conversion
      ? { conversion: { converted: conversion.converted, outsideRange: conversion.outsideRange } }
      : {}),
    excludedNonMoment: selected.excludedNonMoment,
    ...(declustering ? { declustering } : {}),
    zone: {
      given: options.rings !== undefined,
      eventsInZone: fitted.length,
      eventsOutside: kept.length - fitted.length,
    },
    observation: { startMs: span.startMs, endMs: span.endMs, years: akiUtsu.observationYears },
    completeness: curvature
      ? {
          method: 'max-curvature',
          mc,
          peakMagnitude: curvature.peakMagnitude,
          correction,
          ...(overTime ? { windows: overTime.windows } : {}),
        }
      : { method: 'fixed', mc, ...(overTime ? { windows: overTime.windows } : {}) },
    akiUtsu,
    ...(weichert ? { weichert } : {}),
    ...(periods ? { periods } : {}),
    ...(recurrence ? { recurrence } : {}),
    frequencyMagnitude: plot,
    notes: [...new Set(notes)],
  };
}

const sig2 = (x: number): string => String(Number(x.toPrecision(2)));

/** A finding in words, with what to check and the option that helps. */
function findingText(f: FitFinding, names: FitOptionNames, years: number): string {
  switch (f.kind) {
    case 'b-outside-usual':
      return `b = ${f.bValue.toFixed(2)} lies outside the usual ${USUAL_B_RANGE[0]}–${USUAL_B_RANGE[1]}: check the completeness magnitude and whether completeness changed over time (${names.periods}) before using this recurrence`;
    case 'large-magnitudes-disagree':
      return (
        `the fitted line gives ${sig2(f.predicted)} events of M ${f.magnitude.toFixed(2)} or more in the ${sig2(years)} years, the catalog has ${f.observed} ` +
        `(a Poisson chance of ${sig2(f.chance)} of a count this far ${f.observed < f.predicted ? 'below' : 'above'}): the line does not fit the largest magnitudes; ` +
        `check the completeness magnitude and b, and try completeness periods (${names.periods})`
      );
    case 'completeness-changes':
      return `completeness looks time-dependent: Mc reaches ${f.highestMc.toFixed(1)} in part of the catalog (${f.earliestMc.toFixed(1)} in its earliest part) against the ${f.mcUsed.toFixed(1)} used for the whole; give completeness periods (${names.periods})`;
    case 'most-removed':
      return `declustering removed ${Math.round((100 * f.removed) / f.total)}% of the events (${f.removed} of ${f.total}) as foreshocks and aftershocks; in a dense catalog without real clusters this means the Gardner & Knopoff (1974) windows join independent events: check the windows, or compare a fit without declustering (${names.decluster})`;
  }
}
