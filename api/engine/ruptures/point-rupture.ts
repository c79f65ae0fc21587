import type { Mechanism, PointSource, ZoneSource } from '../model.ts';
import type { RuptureContext } from '../motion/types.ts';
import { scaledDimensions, scalingRelationFor } from '../geometry/rupture-scaling.ts';
import { toRadians } from '../units.ts';

/**
 * Dip given to point ruptures, which have no plane, by mechanism: the defaults Kaklamanos,
 * Baise & Boore (2011), "Estimating unknown input parameters when implementing the NGA
 * ground-motion prediction equations in engineering practice", Earthquake Spectra 27(4),
 * recommend (from memory).
 */
export const POINT_DIP_DEG: Readonly<Record<Mechanism, number>> = {
  'strike-slip': 90,
  reverse: 40,
  normal: 50,
};

/**
 * Fraction of the rupture width above the hypocentre when placing a virtual rupture's top:
 * Ztor = max(Zhyp - 0.6 W sin(dip), 0), Kaklamanos et al. (2011) (from memory).
 */
const HYPOCENTRE_DOWN_DIP_FRACTION = 0.6;

/**
 * The rupture context of a point rupture (zone cell or point source) at `magnitude`: the
 * source's depth is the hypocentral depth; width is the median of the setting's scaling
 * relation and the top of rupture follows from them, for the models that take these even
 * though the distances treat the rupture as a point (geometry/distances.ts).
 */
export function pointRuptureContext(
  source: ZoneSource | PointSource,
  magnitude: number,
  depthKm: number = source.depthKm,
): RuptureContext {
  const dipDeg = POINT_DIP_DEG[source.mechanism];
  const { widthKm } = scaledDimensions(
    scalingRelationFor(source.setting, source.mechanism),
    magnitude,
  );
  const ztorKm = Math.max(
    depthKm - HYPOCENTRE_DOWN_DIP_FRACTION * widthKm * Math.sin(toRadians(dipDeg)),
    0,
  );
  return {
    magnitude,
    rakeDeg: source.rakeDeg,
    mechanism: source.mechanism,
    setting: source.setting,
    dipDeg,
    ztorKm,
    widthKm,
    hypoDepthKm: depthKm,
  };
}
