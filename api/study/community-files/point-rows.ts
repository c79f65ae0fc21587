import type { Feature, Geometry } from 'geojson';
import type { IssueList } from '../issues.ts';
import type { TableCell, TableRow } from './community-table.ts';

/** Properties that describe how a placemark is drawn, not the place: left out of the columns. */
const STYLE_PROPERTIES =
  /^(styleUrl|styleHash|styleMapHash|stroke|stroke-opacity|stroke-width|fill|fill-opacity|icon|icon-.*|label-.*|marker-.*|visibility|timestamp)$/i;

/** A property value as a cell: objects (KML's rich description) as text. */
function cellOf(value: unknown): TableCell {
  if (value === null || value === undefined) return null;
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean')
    return value;
  if (typeof value === 'object' && 'value' in (value as object))
    return String((value as { value: unknown }).value);
  return JSON.stringify(value);
}

export interface PointRows {
  readonly columns: string[];
  readonly rows: TableRow[];
}

/**
 * Rows from point features (placemarks, shapefile records, GeoJSON features), numbered from 1
 * as `[<unit> n]`. A feature that is not a single point is reported and left out: a village is
 * one place.
 */
export function pointRows(
  features: readonly Feature<Geometry | null>[],
  unit: string,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): PointRows {
  const columns: string[] = [];
  const rows: TableRow[] = [];
  features.forEach((feature, i) => {
    const where = `[${unit} ${i + 1}]`;
    const props = (feature.properties ?? {}) as Record<string, unknown>;
    let geometry = feature.geometry;
    if (geometry?.type === 'MultiPoint' && geometry.coordinates.length === 1)
      geometry = { type: 'Point', coordinates: geometry.coordinates[0] as number[] };
    const label = typeof props.name === 'string' ? ` ("${props.name}")` : '';
    if (geometry?.type !== 'Point') {
      issues.add(
        [...rootPath, where],
        `${fileName}: ${unit} ${i + 1}${label}: expected a point (one position per community), got ${geometry ? `a ${geometry.type}` : 'no geometry'}`,
      );
      return;
    }
    const [lon, lat] = geometry.coordinates as [number, number];
    if (!Number.isFinite(lon) || !Number.isFinite(lat)) {
      issues.add(
        [...rootPath, where],
        `${fileName}: ${unit} ${i + 1}${label}: expected finite coordinates, got ${JSON.stringify(geometry.coordinates)}`,
      );
      return;
    }
    const cells: Record<string, TableCell> = {};
    for (const [key, value] of Object.entries(props)) {
      if (STYLE_PROPERTIES.test(key)) continue;
      if (!columns.includes(key)) columns.push(key);
      cells[key] = cellOf(value);
    }
    rows.push({ where, cells, lonLat: [lon, lat] });
  });
  return { columns, rows };
}
