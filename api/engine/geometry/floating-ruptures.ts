import { InvalidInput } from '../errors.ts';
import type { PointKm, RupturePlane } from '../ruptures/rupture.ts';
import { pointOnSurface, surfacePatch, type FaultSurface } from './fault-surface.ts';
import type { RuptureDimensions } from './rupture-scaling.ts';

/** One position of a rupture of fixed size on a fault surface. */
export interface FloatingRupture {
  /** One plane per trace segment the rupture covers, in trace order. */
  readonly planes: readonly RupturePlane[];
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
 * Start offsets (km) of a rupture of `sizeKm` along an extent of `extentKm`: evenly spaced from
 * 0 to extentKm - sizeKm, no more than `spacingKm` apart, so the first and last positions reach
 * the two ends; one position at 0 when the rupture fills the extent.
 */
export function positionOffsetsKm(extentKm: number, sizeKm: number, spacingKm: number): number[] {
  const room = extentKm - sizeKm;
  if (room <= FIT_SLACK_KM) return [0];
  const gaps = Math.max(1, Math.ceil((room - FIT_SLACK_KM) / spacingKm));
  return Array.from({ length: gaps + 1 }, (_, k) => (room * k) / gaps);
}

export interface FloatingRupturesOptions {
  /** Largest step between neighbouring positions along strike and down dip, km. */
  readonly spacingKm: number;
}

/**
 * Every position of a rupture of `dimensions` (already fitted to the fault, see
 * rupture-scaling.ts fitDimensions) on `surface`, in rows from the top down, each row along
 * strike from the trace's start; neighbours at most `spacingKm` apart. A rupture follows the trace across segment
 * joints, so it is then several planes.
 */
export function floatingRuptures(surface: FaultSurface, dimensions: RuptureDimensions, options: FloatingRupturesOptions): FloatingRupture[] {
  const { spacingKm } = options;
  if (!(spacingKm > 0)) throw new InvalidInput([{ path: 'settings.ruptureSpacingKm', message: `expected a spacing > 0 km, got ${spacingKm}` }]);
  const lengthKm = Math.min(dimensions.lengthKm, surface.lengthKm);
  const widthKm = Math.min(dimensions.widthKm, surface.widthKm);
  const ruptures: FloatingRupture[] = [];
  for (const downDipKm of positionOffsetsKm(surface.widthKm, widthKm, spacingKm)) {
    for (const alongKm of positionOffsetsKm(surface.lengthKm, lengthKm, spacingKm)) {
      ruptures.push(floatingRuptureAt(surface, { lengthKm, widthKm }, alongKm, downDipKm));
    }
  }
  return ruptures;
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
  return {
    planes: surfacePatch(surface, [alongKm, alongKm + lengthKm], [downDipKm, downDipKm + widthKm]),
    hypocentre: pointOnSurface(surface, alongKm + lengthKm / 2, downDipKm + widthKm / 2),
    ztorKm: surface.upperDepthKm + downDipKm * surface.sinDip,
    lengthKm,
    widthKm,
    alongKm,
    downDipKm,
  };
}
