/**
 * One earthquake of a catalog, as every catalog analysis reads it. Parsers at the edge
 * (api/catalog/) build these from CSV, FDSN text or QuakeML.
 */
export interface CatalogEvent {
  /** Unique within a catalog. */
  readonly id: string;
  /** Origin time, UTC epoch milliseconds. */
  readonly timeMs: number;
  /** Epicentre, WGS84 degrees. */
  readonly lon: number;
  readonly lat: number;
  /**
   * Hypocentral depth below sea level, km; null when the catalog gives none (recurrence does
   * without it, the felt history leaves such events out).
   */
  readonly depthKm: number | null;
  readonly magnitude: number;
  /** As reported ("Mw", "Mww", "ML", "mb" ...); "unknown" when the source gave none. */
  readonly magnitudeType: string;
}

/** Julian year (IAU): 365.25 days. Rates per year in the catalog analyses use it. */
export const MS_PER_YEAR = 365.25 * 86_400_000;
export const MS_PER_DAY = 86_400_000;

/** The span between two instants in Julian years. */
export const yearsBetween = (startMs: number, endMs: number): number =>
  (endMs - startMs) / MS_PER_YEAR;
