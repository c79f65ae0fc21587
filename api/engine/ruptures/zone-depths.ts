import { InvalidInput } from '../errors.ts';
import { depthUnderKm } from '../geometry/depth-below.ts';
import { faultSurface, wholeSurface } from '../geometry/fault-surface.ts';
import type { LocalFrame, PointXY } from '../geometry/projection.ts';
import type { Source, WeightedDepth, ZoneSource } from '../model.ts';

/** The hypocentral depths (km, with weights summing to 1) of a zone's earthquakes at a cell centre. */
export type DepthsAt = (centre: PointXY) => readonly WeightedDepth[];

/**
 * Where a zone's earthquakes lie in depth: its one `depthKm`; its weighted `depths`; or, with
 * `depthFrom`, `offsetKm` below the surface of the named contoured fault straight under each
 * cell's centre (geometry/depth-below.ts: off the surface's map outline, the depth at its
 * nearest edge), so a slab zone's hypocentres follow the slab. `sources` are the study's.
 */
export function zoneDepths(
  zone: ZoneSource,
  sources: readonly Source[],
  frame: LocalFrame,
): DepthsAt {
  if (zone.depthFrom) {
    const { sourceId, offsetKm } = zone.depthFrom;
    const surfaceSource = sources.find((s) => s.id === sourceId);
    if (surfaceSource?.kind !== 'fault' || !surfaceSource.contours)
      throw new InvalidInput([
        {
          path: 'depthFromSource.id',
          message: `expected the id of a fault given by depth contours in this study, got "${sourceId}"`,
        },
      ]);
    const whole = wholeSurface(faultSurface(surfaceSource, frame));
    const planes = whole.kind === 'planes' ? whole.planes : [];
    // Every magnitude asks again at the same cell centres (the prepared cells' own points); the
    // search over the surface's planes is done once per centre.
    const known = new Map<PointXY, readonly WeightedDepth[]>();
    return (centre) => {
      let depths = known.get(centre);
      if (!depths) {
        depths = [
          { depthKm: (depthUnderKm(planes, centre) ?? zone.depthKm) + offsetKm, weight: 1 },
        ];
        known.set(centre, depths);
      }
      return depths;
    };
  }
  const fixed = zone.depths ?? [{ depthKm: zone.depthKm, weight: 1 }];
  return () => fixed;
}
