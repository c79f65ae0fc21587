import { scaledDimensions, scalingRelationFor } from '../geometry/rupture-scaling.ts';
import type { PointSource, ZoneSource } from '../model.ts';
import type { RuptureContext } from '../motion/types.ts';
import { toRadians } from '../units.ts';
import type { PlacedRupture } from './placement.ts';
import { POINT_DIP_DEG } from './point-rupture.ts';
import type { PointKm, RupturePlane } from './rupture.ts';

/**
 * From this magnitude up, a zone's or point source's earthquakes are finite ruptures, not
 * points. At M 6.0 the median crustal rupture is already 13 km long and 7 km wide (Wells &
 * Coppersmith 1994 Table 2A, strike-slip: RA 95 km², RW 7.2 km), longer than the default zone
 * cell; epicentral and hypocentral distance then overstate the distance to the rupture for
 * sites near it (common practice: the virtual ruptures of many hazard models start near M 6).
 */
export const FINITE_RUPTURE_MIN_MAGNITUDE = 6;

/**
 * How many strikes each point earthquake is spread over, each with an equal share of its rate.
 * A power of two, so every share is its rate divided exactly. Eight strikes keep the mean PGA
 * of a dipping M 5–7.5 point source within 0.24% (475 years) and 1.03% (2475 years) of 36
 * strikes at sites 0 to 30 km from it; four strikes were 1.9% off at 475 years
 * (test/engine/ruptures/virtual-ruptures.test.ts).
 */
export const VIRTUAL_STRIKE_COUNT = 8;

/**
 * The strikes of the virtual ruptures, degrees clockwise from north, spread evenly: over
 * 0–180° for a vertical rupture (a strike and its opposite are the same plane), over 0–360°
 * for a dipping one, so its hanging wall lies on every side in turn rather than always to the
 * south-west of the strikes 0–180° (which would bias Rx).
 */
export function virtualStrikesDeg(dipDeg: number, count: number = VIRTUAL_STRIKE_COUNT): number[] {
  const spanDeg = dipDeg >= 90 ? 180 : 360;
  return Array.from({ length: count }, (_, k) => (k * spanDeg) / count);
}

/** The seismogenic depths (km) a zone or point source gives its ruptures: from the ground down unless set. */
export function seismogenicDepthsKm(source: ZoneSource | PointSource): {
  upperKm: number;
  lowerKm: number;
} {
  return { upperKm: source.upperDepthKm ?? 0, lowerKm: source.lowerDepthKm ?? Infinity };
}

/** A virtual rupture's plane as offsets from its epicentre, and the numbers its context takes. */
export interface VirtualPlane {
  /** Corners (x, y relative to the epicentre; z absolute depth), km, in RupturePlane order. */
  readonly corners: readonly [PointKm, PointKm, PointKm, PointKm];
  readonly ztorKm: number;
  readonly widthKm: number;
  readonly lengthKm: number;
}

export interface VirtualPlaneOptions {
  readonly strikeDeg: number;
  readonly dipDeg: number;
  /** Median rupture area and width of the scaling relation at the magnitude, km², km. */
  readonly areaKm2: number;
  readonly widthKm: number;
  readonly hypoDepthKm: number;
  readonly upperKm: number;
  readonly lowerKm: number;
}

/**
 * One virtual rupture: a rectangle of the scaled area and width, with the given strike and dip
 * (dipping to the right of the strike, the right-hand rule of rupture.ts), its centre at the
 * hypocentre. It is kept within the seismogenic depths as a fault's floating ruptures are
 * (rupture-scaling.ts fitDimensions): the width capped at the layer's down-dip width and the
 * length grown to keep the area, then the rectangle moved along its dip until it lies inside
 * the layer (the hypocentre stays on its plane, off-centre).
 */
export function virtualPlane(o: VirtualPlaneOptions): VirtualPlane {
  const dip = toRadians(o.dipDeg);
  const sinDip = Math.sin(dip);
  const cosDip = Math.abs(Math.cos(dip)) < 1e-12 ? 0 : Math.cos(dip);
  const layerWidthKm = (o.lowerKm - o.upperKm) / sinDip;
  const widthKm = Math.min(o.widthKm, layerWidthKm);
  const lengthKm = o.areaKm2 / widthKm;
  const verticalKm = widthKm * sinDip;
  const ztorKm = Math.min(
    Math.max(o.hypoDepthKm - verticalKm / 2, o.upperKm),
    o.lowerKm - verticalKm,
  );
  // The top edge's centre lies up dip of the hypocentre by (hypocentre depth − top) / tan(dip).
  const upDipKm = sinDip === 0 ? 0 : ((o.hypoDepthKm - ztorKm) / sinDip) * cosDip;
  const strike = toRadians(o.strikeDeg);
  const sx = Math.sin(strike),
    sy = Math.cos(strike);
  // Dip direction: to the right of the strike.
  const dx = sy,
    dy = -sx;
  const tx = -upDipKm * dx,
    ty = -upDipKm * dy;
  const half = lengthKm / 2;
  const bx = widthKm * cosDip * dx,
    by = widthKm * cosDip * dy;
  const zBottom = ztorKm + verticalKm;
  return {
    corners: [
      { x: tx - half * sx, y: ty - half * sy, z: ztorKm },
      { x: tx + half * sx, y: ty + half * sy, z: ztorKm },
      { x: tx + half * sx + bx, y: ty + half * sy + by, z: zBottom },
      { x: tx - half * sx + bx, y: ty - half * sy + by, z: zBottom },
    ],
    ztorKm,
    widthKm,
    lengthKm,
  };
}

/**
 * The virtual ruptures of one point source or zone at `magnitude`, as a function replacing each
 * point placement by VIRTUAL_STRIKE_COUNT planar ones (each with an equal share of its share);
 * below FINITE_RUPTURE_MIN_MAGNITUDE, null: the points stay points. The planes of each depth
 * are worked out once.
 */
export function virtualRupturesAt(
  source: ZoneSource | PointSource,
  magnitude: number,
  context: (depthKm: number) => RuptureContext,
  strikeCount: number = VIRTUAL_STRIKE_COUNT,
): ((placed: PlacedRupture, out: PlacedRupture[]) => void) | null {
  // A bin's centre a rounding below the threshold (5.999999) counts as at it.
  if (magnitude < FINITE_RUPTURE_MIN_MAGNITUDE - 1e-9) return null;
  const dipDeg = POINT_DIP_DEG[source.mechanism];
  const { areaKm2, widthKm } = scaledDimensions(
    scalingRelationFor(source.setting, source.mechanism),
    magnitude,
  );
  const { upperKm, lowerKm } = seismogenicDepthsKm(source);
  const strikes = virtualStrikesDeg(dipDeg, strikeCount);
  const byDepth = new Map<number, { planes: VirtualPlane[]; context: RuptureContext }>();
  const atDepth = (hypoDepthKm: number): { planes: VirtualPlane[]; context: RuptureContext } => {
    let found = byDepth.get(hypoDepthKm);
    if (!found) {
      const planes = strikes.map((strikeDeg) =>
        virtualPlane({ strikeDeg, dipDeg, areaKm2, widthKm, hypoDepthKm, upperKm, lowerKm }),
      );
      const first = planes[0] as VirtualPlane;
      found = {
        planes,
        context: {
          ...context(hypoDepthKm),
          dipDeg,
          ztorKm: first.ztorKm,
          widthKm: first.widthKm,
        },
      };
      byDepth.set(hypoDepthKm, found);
    }
    return found;
  };
  return (placed, out) => {
    if (placed.surface.kind !== 'point') {
      out.push(placed);
      return;
    }
    const h = placed.surface.hypocentre;
    const { planes, context: c } = atDepth(h.z);
    const share = placed.share / planes.length;
    for (const p of planes) {
      const plane: RupturePlane = {
        corners: p.corners.map((q) => ({ x: h.x + q.x, y: h.y + q.y, z: q.z })) as [
          PointKm,
          PointKm,
          PointKm,
          PointKm,
        ],
      };
      const surface = { kind: 'planes' as const, planes: [plane], hypocentre: h };
      out.push(
        placed.cellUse
          ? { ...placed, share, context: c, surface }
          : {
              sourceIndex: placed.sourceIndex,
              sourceId: placed.sourceId,
              share,
              context: c,
              surface,
            },
      );
    }
  };
}
