import type { HazardMapSummary, MapPoint } from './hazard-map.ts';

/**
 * A hazard map as GeoJSON (RFC 7946): a FeatureCollection of Points, WGS84 [lon, lat], each with
 * its value and the value's unit, written piece by piece (head, features, tail) so a map of any
 * size can go to a file or a response as its chunks arrive. What the map is of goes in a
 * foreign member "map" at the head; what is learnt only at the end (warnings) in "warnings".
 */

/** Decimal places kept of longitude and latitude: 1e-6 degrees is about 0.1 m. */
const COORDINATE_DECIMALS = 6;

/** What a map's description says at the head of its file, before any value is known. */
export type MapDescription = Omit<HazardMapSummary, 'warnings'>;

/** The unit of the values: the measure's for a return-period map, a probability (0–1) for a chance map. */
export const valueUnit = (d: Pick<MapDescription, 'unit' | 'quantity'>): string =>
  d.quantity.kind === 'chance' ? 'probability' : d.unit;

export const MAP_CAUTION =
  'Screening estimates on a grid at one Vs30, not design values: building codes and licensed engineers decide.';

/** The opening of the FeatureCollection, up to the first feature. */
export function mapGeoJsonHead(d: MapDescription): string {
  const map = { ...d, valueUnit: valueUnit(d), caution: MAP_CAUTION };
  return `{"type":"FeatureCollection","map":${JSON.stringify(map)},"features":[\n`;
}

/** One point as a Feature. */
export function mapFeature(
  d: Pick<MapDescription, 'unit' | 'quantity' | 'measure'>,
  p: MapPoint,
): Record<string, unknown> {
  const round = (x: number): number => Number(x.toFixed(COORDINATE_DECIMALS));
  return {
    type: 'Feature',
    geometry: { type: 'Point', coordinates: [round(p.lon), round(p.lat)] },
    properties: {
      value: p.value,
      unit: valueUnit(d),
      measure: d.measure,
      status: p.status,
      row: p.row,
      column: p.column,
    },
  };
}

/** Features of a chunk, as text to follow the head (`first` says whether any feature came before). */
export function mapGeoJsonFeatures(
  d: Pick<MapDescription, 'unit' | 'quantity' | 'measure'>,
  points: readonly MapPoint[],
  first: boolean,
): string {
  if (points.length === 0) return '';
  return `${first ? '' : ',\n'}${points.map((p) => JSON.stringify(mapFeature(d, p))).join(',\n')}`;
}

/** The close of the FeatureCollection, with the map's warnings. */
export function mapGeoJsonTail(summary: Pick<HazardMapSummary, 'warnings'>): string {
  return `\n],"warnings":${JSON.stringify(summary.warnings)}}\n`;
}

/** The description of a planned or finished map. */
export function mapDescription(s: MapDescription): MapDescription {
  return {
    measure: s.measure,
    unit: s.unit,
    quantity: s.quantity,
    vs30: s.vs30,
    spacingKm: s.spacingKm,
    columns: s.columns,
    rows: s.rows,
    count: s.count,
  };
}
