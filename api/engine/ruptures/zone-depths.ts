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
        const depthKm = (depthUnderKm(planes, centre) ?? zone.depthKm) + offsetKm;
        depths = [{ depthKm: toFollowedDepthStep(depthKm), weight: 1 }];
        known.set(centre, depths);
      }
      return depths;
    };
  }
  const fixed = zone.depths ?? [{ depthKm: zone.depthKm, weight: 1 }];
  return () => fixed;
}

/**
 * Depths that follow a surface are taken to the nearest FOLLOWED_DEPTH_STEP_KM: far finer than
 * any slab model's contours are known (common practice: slab depth models are uncertain by
 * kilometres), and cells at one depth then share one rupture context, whose ground-motion work
 * the fast path does once (hazard/rupture-table.ts distinctContexts).
 */
export const FOLLOWED_DEPTH_STEP_KM = 0.1;

const toFollowedDepthStep = (depthKm: number): number =>
  Math.round(depthKm / FOLLOWED_DEPTH_STEP_KM) / (1 / FOLLOWED_DEPTH_STEP_KM);
