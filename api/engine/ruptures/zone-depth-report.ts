import { frameForStudy } from '../geometry/projection.ts';
import { zoneCells } from '../geometry/zone-cells.ts';
import type { Study } from '../model.ts';
import type { ZoneDepthReport } from '../results.ts';
import { zoneDepths } from './zone-depths.ts';

/** Positions to 1e-4° (about 10 m) and depths to 0.01 km: enough to read, small to store. */
const round = (value: number, places: number): number => Number(value.toFixed(places));

/**
 * The hypocentral depths each cell of a zone was given (zone-depths.ts), for the results'
 * diagnostics: every zone whose depths follow a contoured surface (`depthFromSource`) or come
 * as a weighted list (`depths`), cell by cell at the study's zone cell size (the cells refined
 * near a community take their cell's surface depth at their own centres, within the cell).
 */
export function zoneDepthReport(study: Study): ZoneDepthReport[] {
  const frame = frameForStudy(study);
  const reports: ZoneDepthReport[] = [];
  for (const zone of study.sources) {
    if (zone.kind !== 'zone' || (!zone.depthFrom && !zone.depths)) continue;
    const depthsAt = zoneDepths(zone, study.sources, frame);
    reports.push({
      sourceId: zone.id,
      name: zone.name,
      basis: zone.depthFrom
        ? { depthFromSource: zone.depthFrom.sourceId, offsetKm: zone.depthFrom.offsetKm }
        : 'depths',
      cells: zoneCells(zone, frame, study.settings.zoneCellKm).map((cell) => {
        const [lon, lat] = frame.toLonLat(cell.centre);
        return {
          lon: round(lon, 4),
          lat: round(lat, 4),
          depths: depthsAt(cell.centre).map((d) => ({
            depthKm: round(d.depthKm, 2),
            weight: d.weight,
          })),
        };
      }),
    });
  }
  return reports;
}
