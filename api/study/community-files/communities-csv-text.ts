import Papa from 'papaparse';
import type { Community } from '../../engine/model.ts';
import { COMMUNITY_COLUMNS } from '../community-schema.ts';

/**
 * Validated communities as CSV with Tremora's own header, then their details' columns. An
 * import of any format is kept in the store in this form, so the saved study reads back
 * through the CSV reader to the same communities (vs30 written only where it was given).
 */
export function communitiesCsvText(communities: readonly Community[]): string {
  const detailColumns = [...new Set(communities.flatMap((c) => Object.keys(c.details ?? {})))];
  const rows = communities.map((c) => {
    const own: Record<string, string | number | boolean | undefined> = {
      id: c.id,
      name: c.name,
      lon: c.lon,
      lat: c.lat,
      vs30: c.vs30Basis === 'measured' ? c.vs30 : undefined,
      siteClass: c.siteClass,
      population: c.population,
      coastal: c.coastal,
      elevationM: c.elevationM,
    };
    return [
      ...COMMUNITY_COLUMNS.map((f) => own[f] ?? ''),
      ...detailColumns.map((d) => c.details?.[d] ?? ''),
    ];
  });
  return `${Papa.unparse({ fields: [...COMMUNITY_COLUMNS, ...detailColumns], data: rows }, { newline: '\n' })}\n`;
}
