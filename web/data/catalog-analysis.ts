import { fitCatalog, type CatalogFit } from '../../api/catalog/catalog-fit.ts';
import { readCatalogText } from '../../api/catalog/catalog-input.ts';
import type { CatalogFormat } from '../../api/catalog/catalog-formats.ts';
import type { CatalogLoad } from '../../api/catalog/catalog-load.ts';
import type { GutenbergRichterFit } from '../../api/engine/catalog/gutenberg-richter-fit.ts';
import type { ZoneRecurrence } from '../../api/engine/catalog/zone-recurrence.ts';
import { InvalidInput, type InputIssue } from '../../api/engine/errors.ts';
import type { LonLat } from '../../api/engine/model.ts';

/**
 * What the catalog view shows, as the catalog's CLI verb and API route compute it
 * (api/catalog/catalog-fit.ts fitCatalog): Gardner & Knopoff (1974) declustering, Mc by maximum
 * curvature + 0.2 (Woessner & Wiemer 2005), completeness periods proposed from windows of 100
 * events when there are enough, Weichert (1980) over them (else Aki–Utsu with Shi & Bolt's σ),
 * and the frequency–magnitude data with the fit. Moment magnitudes only, the default.
 */
export type CatalogAnalysis =
  | {
      readonly ok: true;
      readonly load: CatalogLoad;
      readonly fit?: CatalogFit;
      readonly problem?: string;
    }
  /** The text cannot be read, or no event loads from it. */
  | { readonly ok: false; readonly issues: readonly InputIssue[] };

/** Events per window when completeness periods are proposed (fitCatalog's default). */
const EVENTS_PER_WINDOW = 100;

const fitOptions = (events: number) =>
  events >= 2 * EVENTS_PER_WINDOW ? { periods: 'proposed' as const } : {};

/** The fit the view leads with: Weichert when there are completeness periods, else Aki–Utsu. */
export const chosenFit = (fit: CatalogFit): GutenbergRichterFit => fit.weichert ?? fit.akiUtsu;

/**
 * The catalog view's analysis of catalog text; `conversions` (relation ids of
 * engine/catalog/magnitude-conversion.ts, chosen on the page) convert ML, mb or Ms to Mw first.
 */
export function analyseCatalog(
  text: string,
  format?: CatalogFormat,
  conversions: readonly string[] = [],
): CatalogAnalysis {
  let load: CatalogLoad;
  try {
    load = readCatalogText(text, format);
  } catch (error) {
    if (error instanceof InvalidInput) return { ok: false, issues: error.issues };
    throw error;
  }
  try {
    const options = {
      ...fitOptions(load.events.length),
      ...(conversions.length > 0 ? { conversions } : {}),
    };
    return { ok: true, load, fit: fitCatalog(load.events, options) };
  } catch (error) {
    if (error instanceof InvalidInput)
      return { ok: true, load, problem: error.issues.map((i) => i.message).join('; ') };
    throw error;
  }
}

export interface ZoneFitRequest {
  readonly rings: readonly (readonly LonLat[])[];
  readonly mMax: number;
}

/** A background zone's recurrence from the catalog's events inside the zone outline. */
export function fitZone(load: CatalogLoad, request: ZoneFitRequest): ZoneRecurrence {
  const fit = fitCatalog(load.events, {
    ...fitOptions(load.events.length),
    rings: request.rings,
    mMax: request.mMax,
  });
  if (!fit.recurrence)
    throw new InvalidInput([
      { path: 'mMax', message: 'expected the largest magnitude of the zone' },
    ]);
  return fit.recurrence;
}
