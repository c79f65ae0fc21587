import { InvalidInput } from '../errors.ts';
import type { PointKm, RupturePlane } from '../ruptures/rupture.ts';
import { pointOnSurface, surfacePiece, type FaultSurface } from './fault-surface.ts';
import { meanDipDeg } from './mesh-patch.ts';
import type { RuptureDimensions } from './rupture-scaling.ts';

/** One position of a rupture of fixed size on a fault surface. */
export interface FloatingRupture {
  /**
   * One plane per trace segment the rupture covers, in trace order; on a contoured fault its
   * cut mesh cells, rows from the top down (fault-surface.ts surfacePiece).
   */
  readonly planes: readonly RupturePlane[];
  /** How many leading planes make the top row (its top trace, for GC2). */
  readonly tracePlanes: number;
  /** The rupture's dip, degrees: the fault's, or on a mesh its planes' area-weighted mean. */
  readonly dipDeg: number;
  /** The rupture's centre, common practice for the hypocentre of a floating rupture. */
  readonly hypocentre: PointKm;
  /** Depth of the rupture's top edge, km. */
  readonly ztorKm: number;
  readonly lengthKm: number;
  readonly widthKm: number;
  /** Where the rupture starts along the top trace and down dip, km. */
  readonly alongKm: number;
  readonly downDipKm: number;
}

/**
 * Slack when counting positions, km: a length that fits a whole number of spacings up to
 * rounding gets no extra position.
 */
const FIT_SLACK_KM = 1e-9;

/**
 * Start offsets (km) of a rupture of `sizeKm` along an extent of `extentKm`, by the midpoint
 * rule: the room (extentKm - sizeKm) is cut into the fewest equal intervals no wider than
 * `spacingKm`, and each interval puts one position at its middle, with an equal share. The
 * rupture's start is uniform over the room, and the midpoint rule integrates over that
 * uniform start with an error of order spacing² (Press et al. 2007, Numerical Recipes 3rd ed.,
 * section 4.1); putting equal shares on both ends as well over-weights the fault's ends
 * (test/engine/hazard/floating-convergence.test.ts measures both against a fine case). One
 * position at 0 when the rupture fills the extent.
 */
export function positionOffsetsKm(extentKm: number, sizeKm: number, spacingKm: number): number[] {
  const room = extentKm - sizeKm;
  if (room <= FIT_SLACK_KM) return [0];
  const intervals = Math.max(1, Math.ceil((room - FIT_SLACK_KM) / spacingKm));
  return Array.from({ length: intervals }, (_, k) => (room * (k + 0.5)) / intervals);
}

/**
 * Start offsets (km) from 0 to extentKm - sizeKm, both ends included, no more than `spacingKm`
 * apart: for searching the placement nearest a site (a scenario's worst case wants the
 * extremes), not for integrating over positions (positionOffsetsKm).
 */
export function endToEndOffsetsKm(extentKm: number, sizeKm: number, spacingKm: number): number[] {
  const room = extentKm - sizeKm;
  if (room <= FIT_SLACK_KM) return [0];
  const gaps = Math.max(1, Math.ceil((room - FIT_SLACK_KM) / spacingKm));
  return Array.from({ length: gaps + 1 }, (_, k) => (room * k) / gaps);
}

export interface FloatingRupturesOptions {
  /** Largest step between neighbouring positions along strike and down dip, km. */
  readonly spacingKm: number;
  /** Positions from end to end (endToEndOffsetsKm) instead of by the midpoint rule; false by default. */
  readonly endToEnd?: boolean;
}

/**
 * Every position of a rupture of `dimensions` (already fitted to the fault, see
 * rupture-scaling.ts fitDimensions) on `surface`, in rows from the top down, each row along
 * strike from the trace's start; neighbours at most `spacingKm` apart, placed by the midpoint
 * rule (positionOffsetsKm). A rupture follows the trace across segment
 * joints, so it is then several planes.
 */
export function floatingRuptures(
  surface: FaultSurface,
  dimensions: RuptureDimensions,
  options: FloatingRupturesOptions,
): FloatingRupture[] {
  const { spacingKm } = options;
  if (!(spacingKm > 0))
    throw new InvalidInput([
      { path: 'settings.ruptureSpacingKm', message: `expected a spacing > 0 km, got ${spacingKm}` },
    ]);
  const lengthKm = Math.min(dimensions.lengthKm, surface.lengthKm);
  const widthKm = Math.min(dimensions.widthKm, surface.widthKm);
  const ruptures: FloatingRupture[] = [];
  const offsetsKm = options.endToEnd ? endToEndOffsetsKm : positionOffsetsKm;
  for (const downDipKm of offsetsKm(surface.widthKm, widthKm, spacingKm)) {
    for (const alongKm of offsetsKm(surface.lengthKm, lengthKm, spacingKm)) {
      ruptures.push(floatingRuptureAt(surface, { lengthKm, widthKm }, alongKm, downDipKm));
    }
  }
  return ruptures;
}

/** Depth of the shallowest point of the top edges of the first `tracePlanes` planes, km. */
function topDepthKm(planes: readonly RupturePlane[], tracePlanes: number): number {
  let depthKm = Infinity;
  for (let p = 0; p < tracePlanes; p++) {
    const [a, b] = (planes[p] as RupturePlane).corners;
    depthKm = Math.min(depthKm, a.z, b.z);
  }
  return depthKm;
}

/**
 * The rupture of `size` (already fitted to the fault) starting `alongKm` along the top trace
 * and `downDipKm` down dip from it, km.
 */
export function floatingRuptureAt(
  surface: FaultSurface,
  size: { readonly lengthKm: number; readonly widthKm: number },
  alongKm: number,
  downDipKm: number,
): FloatingRupture {
  const { lengthKm, widthKm } = size;
  const { planes, tracePlanes } = surfacePiece(
    surface,
    [alongKm, alongKm + lengthKm],
    [downDipKm, downDipKm + widthKm],
  );
  return {
    planes,
    tracePlanes,
    dipDeg: surface.mesh ? meanDipDeg(planes) : surface.dipDeg,
    hypocentre: pointOnSurface(surface, alongKm + lengthKm / 2, downDipKm + widthKm / 2),
    ztorKm: surface.mesh
      ? topDepthKm(planes, tracePlanes)
      : surface.upperDepthKm + downDipKm * surface.sinDip,
    lengthKm,
    widthKm,
    alongKm,
    downDipKm,
  };
}
