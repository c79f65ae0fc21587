import type { CompletenessPeriod } from '../engine/catalog/completeness-periods.ts';
import type { CatalogEvent } from '../engine/catalog/event.ts';
import type { GutenbergRichterFit } from '../engine/catalog/gutenberg-richter-fit.ts';
import {
  FELT_MMI,
  STRONGLY_FELT_MMI,
  type FeltEstimate,
  type FeltHistory,
} from '../engine/catalog/felt-history.ts';
import type { CatalogFit } from './catalog-fit.ts';
import { describeCatalogLoad, type CatalogLoad } from './catalog-load.ts';

/**
 * Catalog results as the API answers them and `--json` prints them: times as ISO 8601 UTC,
 * field names those of our catalog CSV (api/catalog/csv.ts), so an answer reads like a file.
 */

export const isoTime = (timeMs: number): string => new Date(timeMs).toISOString();

/** One event: `{ id, time, lon, lat, depthKm, magnitude, magnitudeType }`. */
export const catalogEventJson = (e: CatalogEvent) => ({
  id: e.id,
  time: isoTime(e.timeMs),
  lon: e.lon,
  lat: e.lat,
  depthKm: e.depthKm,
  magnitude: e.magnitude,
  magnitudeType: e.magnitudeType,
});

/** A load's counts, rejected records with their reasons, notes, and the plain paragraph. */
export const catalogLoadJson = (load: CatalogLoad) => ({
  format: load.format,
  summary: load.summary,
  rejected: load.rejected,
  notes: load.notes,
  description: describeCatalogLoad(load),
});

const feltEventJson = (e: FeltEstimate) => ({
  eventId: e.eventId,
  time: isoTime(e.timeMs),
  date: e.date,
  magnitude: e.magnitude,
  magnitudeType: e.magnitudeType,
  depthKm: e.depthKm,
  setting: e.setting,
  distanceKm: e.distanceKm,
  bearingDeg: e.bearingDeg,
  compass: e.compass,
  pgaG: e.pgaG,
  mmi: e.mmi,
  roman: e.roman,
});

/**
 * A felt history without the full list of estimates (every event near every community): per
 * community the number of events considered and the events likely felt and strongly felt.
 */
export const feltJson = (history: FeltHistory) => ({
  eventCount: history.eventCount,
  excludedNonMoment: history.excludedNonMoment,
  excludedWithoutDepth: history.excludedWithoutDepth,
  crustalMaxDepthKm: history.crustalMaxDepthKm,
  feltMmi: FELT_MMI,
  stronglyFeltMmi: STRONGLY_FELT_MMI,
  notes: history.notes,
  communities: history.communities.map((c) => ({
    communityId: c.communityId,
    name: c.name,
    consideredEvents: c.estimates.length,
    felt: c.felt.map(feltEventJson),
    stronglyFelt: c.stronglyFelt.map(feltEventJson),
  })),
});

const grFitJson = (f: GutenbergRichterFit) => ({
  method: f.method,
  bValue: f.bValue,
  sigmaB: f.sigmaB,
  aValue: f.aValue,
  mc: f.mc,
  magnitudeStep: f.magnitudeStep,
  referenceMagnitude: f.referenceMagnitude,
  rateAtReference: f.rateAtReference,
  sigmaRate: f.sigmaRate,
  eventCount: f.eventCount,
  meanMagnitude: f.meanMagnitude,
  observationYears: f.observationYears,
});

const periodJson = (p: CompletenessPeriod) => ({
  magnitude: p.magnitude,
  start: isoTime(p.startMs),
});

/** A catalog fit (catalog-fit.ts); parts that were not asked for are null. */
export const catalogFitJson = (fit: CatalogFit) => {
  const d = fit.declustering;
  const r = fit.recurrence;
  const c = fit.completeness;
  return {
    magnitudes: fit.magnitudes,
    excludedNonMoment: fit.excludedNonMoment,
    conversion: fit.conversion ?? null,
    declustering: d
      ? {
          applied: true,
          windows: d.windows,
          mainshocks: d.mainshocks.length,
          removed: d.removed.length,
          clusters: d.clusterCount,
          removedEvents: d.removed.map((x) => ({
            ...catalogEventJson(x.event),
            mainshockId: x.mainshockId,
            distanceKm: x.distanceKm,
            daysFromMainshock: x.daysFromMainshock,
          })),
        }
      : { applied: false },
    zone: fit.zone,
    observation: {
      start: isoTime(fit.observation.startMs),
      end: isoTime(fit.observation.endMs),
      years: fit.observation.years,
    },
    completeness: {
      method: c.method,
      mc: c.mc,
      peakMagnitude: c.peakMagnitude ?? null,
      correction: c.correction ?? null,
      windows:
        c.windows?.map((w) => ({
          start: isoTime(w.startMs),
          end: isoTime(w.endMs),
          eventCount: w.eventCount,
          mc: w.mc,
        })) ?? null,
    },
    akiUtsu: grFitJson(fit.akiUtsu),
    weichert: fit.weichert ? grFitJson(fit.weichert) : null,
    periods: fit.periods?.map(periodJson) ?? null,
    recurrence: r
      ? {
          recurrence: r.recurrence,
          method: r.fit.method,
          bValue: r.bValue,
          sigmaB: r.sigmaB,
          rate: r.rate,
          sigmaRate: r.sigmaRate,
          eventCount: r.eventCount,
          summary: r.summary,
          notes: r.notes,
        }
      : null,
    frequencyMagnitude: {
      bins: fit.frequencyMagnitude.bins,
      fittedLine: fit.frequencyMagnitude.fittedLine ?? null,
    },
    warnings: fit.warnings,
    notes: fit.notes,
  };
};
