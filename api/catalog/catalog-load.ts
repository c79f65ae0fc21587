import type { CatalogEvent } from '../engine/catalog/event.ts';
import { countMagnitudeTypes, isMomentMagnitudeType } from '../engine/catalog/magnitude-type.ts';

import type { CatalogFormat } from './catalog-formats.ts';

/** A record that could not be loaded, where it was and why. */
export interface RejectedRecord {
  /** "line 7" for the text formats, "event 3 (smi:local/event/3)" for QuakeML. */
  readonly where: string;
  /** 1-based line number (CSV, FDSN text). */
  readonly line?: number;
  /** 1-based position of the event in the file (QuakeML). */
  readonly index?: number;
  /** The record's id or publicID, when it had one. */
  readonly id?: string;
  readonly reasons: readonly string[];
}

export interface CatalogLoadSummary {
  readonly loaded: number;
  readonly rejected: number;
  /** Loaded events by reported magnitude type. */
  readonly byMagnitudeType: Readonly<Record<string, number>>;
  /** Loaded events whose magnitude is not a moment magnitude (left out of analyses by default). */
  readonly nonMoment: number;
  /** Loaded events without a depth: counted in recurrence, left out of the felt history. */
  readonly withoutDepth: number;
}

export interface CatalogLoad {
  readonly format: CatalogFormat;
  readonly events: readonly CatalogEvent[];
  readonly rejected: readonly RejectedRecord[];
  readonly summary: CatalogLoadSummary;
  /** Things worth knowing that are not errors (ignored columns, generated ids). */
  readonly notes: readonly string[];
}

/** Assembles a load; later records whose id repeats an earlier one's are rejected. */
export function catalogLoad(
  format: CatalogFormat,
  candidates: readonly { readonly event: CatalogEvent; readonly where: RejectedRecord }[],
  rejected: readonly RejectedRecord[],
  notes: readonly string[],
): CatalogLoad {
  const seen = new Map<string, string>();
  const events: CatalogEvent[] = [];
  const allRejected = [...rejected];
  for (const { event, where } of candidates) {
    const first = seen.get(event.id);
    if (first !== undefined) {
      allRejected.push({
        ...where,
        id: event.id,
        reasons: [`duplicate id "${event.id}" (first at ${first})`],
      });
      continue;
    }
    seen.set(event.id, where.where);
    events.push(event);
  }
  allRejected.sort((a, b) => (a.line ?? a.index ?? 0) - (b.line ?? b.index ?? 0));
  const types = countMagnitudeTypes(events);
  return {
    format,
    events,
    rejected: allRejected,
    summary: {
      loaded: events.length,
      rejected: allRejected.length,
      byMagnitudeType: types.byType,
      nonMoment: types.nonMoment,
      withoutDepth: events.filter((e) => e.depthKm === null).length,
    },
    notes,
  };
}

/** One plain paragraph on a load: counts, where the rejects are, magnitude types to watch. */
export function describeCatalogLoad(load: CatalogLoad): string {
  const { loaded, rejected, nonMoment, withoutDepth, byMagnitudeType } = load.summary;
  const parts = [`Loaded ${loaded} event${loaded === 1 ? '' : 's'}; rejected ${rejected}.`];
  if (rejected > 0) {
    const shown = load.rejected.slice(0, 10).map((r) => `${r.where}: ${r.reasons.join('; ')}`);
    parts.push(
      `Rejected: ${shown.join(' | ')}${rejected > shown.length ? ` | and ${rejected - shown.length} more` : ''}.`,
    );
  }
  if (nonMoment > 0) {
    const others = Object.entries(byMagnitudeType)
      .filter(([type]) => !isMomentMagnitudeType(type))
      .map(([type, count]) => `${type} ${count}`)
      .join(', ');
    parts.push(
      `${nonMoment} event${nonMoment === 1 ? ' has a magnitude type' : 's have magnitude types'} other than moment magnitude (${others}); analyses use moment magnitudes only unless asked to use all.`,
    );
  }
  if (withoutDepth > 0)
    parts.push(
      `${withoutDepth} event${withoutDepth === 1 ? ' has' : 's have'} no depth: counted in recurrence, left out of the felt history (which needs the distance to the hypocentre).`,
    );
  return parts.join(' ');
}
