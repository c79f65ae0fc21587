import type { CatalogEvent } from './event.ts';

/**
 * Which magnitudes an analysis reads. Recurrence in a study is in moment magnitude
 * (DESIGN.md section 2), so by default only moment magnitudes are used and other scales
 * (ML, mb, Ms, Md ...) are left out rather than silently mixed; 'all' reads every event as is.
 */
export type MagnitudeSelection = 'moment' | 'all';

export interface MagnitudeSelectionOptions {
  /** Default 'moment'. */
  readonly magnitudes?: MagnitudeSelection;
}

/**
 * True for the moment-magnitude family: Mw and its variants by method (Mww, Mwc, Mwb, Mwr,
 * Mwp ...), any letter case. Names follow the IASPEI magnitude nomenclature (common practice).
 */
export function isMomentMagnitudeType(magnitudeType: string): boolean {
  return /^m_?w/i.test(magnitudeType.trim());
}

export interface SelectedEvents {
  readonly events: readonly CatalogEvent[];
  /** How many events were left out for their magnitude type. */
  readonly excludedNonMoment: number;
}

/** The events an analysis should read under `magnitudes`. */
export function selectByMagnitudeType(
  events: readonly CatalogEvent[],
  magnitudes: MagnitudeSelection = 'moment',
): SelectedEvents {
  if (magnitudes === 'all') return { events, excludedNonMoment: 0 };
  const kept = events.filter((e) => isMomentMagnitudeType(e.magnitudeType));
  return { events: kept, excludedNonMoment: events.length - kept.length };
}

/** Event counts by reported magnitude type, and how many are not moment magnitudes. */
export function countMagnitudeTypes(events: readonly CatalogEvent[]): {
  readonly byType: Readonly<Record<string, number>>;
  readonly nonMoment: number;
} {
  const byType: Record<string, number> = {};
  let nonMoment = 0;
  for (const e of events) {
    byType[e.magnitudeType] = (byType[e.magnitudeType] ?? 0) + 1;
    if (!isMomentMagnitudeType(e.magnitudeType)) nonMoment++;
  }
  return { byType, nonMoment };
}
