import type { LonLat } from '../../api/engine/model.ts';

/** A GeoJSON LineString feature as a study's sources hold a fault: its trace ([lon, lat], degrees) and its properties. */
export function lineFeature(trace: readonly LonLat[], properties: Record<string, unknown>) {
  return { type: 'Feature', geometry: { type: 'LineString', coordinates: trace }, properties };
}
