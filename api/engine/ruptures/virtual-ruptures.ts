import { scaledDimensions, scalingRelationFor } from '../geometry/rupture-scaling.ts';
import type { CellLattice } from '../geometry/zone-cells.ts';
import type { PointSource, ZoneSource } from '../model.ts';
import type { RuptureContext } from '../motion/types.ts';
import { toRadians } from '../units.ts';
import type { PlacedRupture } from './placement.ts';
import { POINT_DIP_DEG } from './point-rupture.ts';
import type { PointKm, RupturePlane } from './rupture.ts';

/**
 * From this magnitude up (bins whose centre is M 6.5 or more), a zone's or point source's
 * earthquakes are finite ruptures, not points. Worked from Wells & Coppersmith (1994) Table 2A
 * (coefficients in geometry/rupture-scaling.ts): at M 6.5 the median reverse rupture is
 * 10^(-3.99 + 0.98 x 6.5) = 240 km² and 10^(-1.61 + 0.41 x 6.5) = 11.4 km wide, so 21 km long,
 * and the strike-slip one 27 km long; half of either is more than a 10 km cell and more than
 * the usual crustal hypocentral depth, so Rhypo overstates the distance to the rupture by
 * kilometres for sites within a few tens of km. At M 6.0 the reverse rupture is 11 km long and
 * its half-length within a default cell of the point. Where finite ruptures start is a
 * modelling choice (common practice: hazard models place virtual finite ruptures for the
 * larger magnitudes of gridded seismicity, from about M 6 to 6.5).
 */
export const FINITE_RUPTURE_MIN_MAGNITUDE = 6.5;

/**
 * How many strikes the virtual ruptures take, spread evenly. A point source's earthquake is
 * all of them, each with an equal share of its rate (a power of two, so every share is its
 * rate divided exactly): eight strikes keep the mean PGA of a dipping M 5–7.5 point source
 * within 0.13% (475 years) and 0.76% (2475 years) of 36 strikes at sites 0 to 30 km from it;
 * four strikes were up to 0.95% off. A zone cell's earthquake is one of them
 * (cellStrikeIndex), so a zone has as many ruptures as with points
 * (test/engine/ruptures/virtual-ruptures.test.ts).
 */
export const VIRTUAL_STRIKE_COUNT = 8;

/**
 * Which of the `count` strikes a zone cell's earthquakes of the `magnitudeIndex`-th magnitude
 * bin take, from the cell's place on the zone's own grid: (column + 3 row + magnitudeIndex)
 * mod count. Every run of 8 cells along a row takes every strike, and so does every 3 x 3 block
 * of cells (its offsets column + 3 row run over -4 to 4, nine consecutive values), so a site
 * sees every strike among the cells around it, and each bin shifts the pattern so a cell does
 * not keep one strike at every magnitude. It depends only on the zone and the cell, never on
 * the study's other sources or communities. Against every cell taking all eight strikes, the
 * mean 475- and 2475-year PGA inside and near a zone are within 0.05% and 0.16%
 * (test/engine/ruptures/virtual-zone-strikes.test.ts).
 */
export function cellStrikeIndex(
  lattice: CellLattice,
  magnitudeIndex: number,
  count: number = VIRTUAL_STRIKE_COUNT,
): number {
  const k = (lattice.column + 3 * lattice.row + magnitudeIndex) % count;
  return k < 0 ? k + count : k;
}

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
 * The virtual ruptures of one point source or zone at `magnitude` (the `magnitudeIndex`-th bin
 * of its recurrence), as a function replacing each point placement by planar ones: a zone
 * cell's (a placement with a lattice) by the one of cellStrikeIndex with its whole share, a
 * point source's by `strikeCount` with equal shares of it. Below FINITE_RUPTURE_MIN_MAGNITUDE,
 * null: the points stay points. The planes and context of each hypocentral depth are worked out
 * once, so ruptures at one depth share one context (hazard/rupture-table.ts distinctContexts).
 * The dip is the mechanism's (point-rupture.ts) wherever the hypocentre lies, also where a
 * zone's depths follow a slab surface (zone-depths.ts): there the plane is centred on the
 * hypocentre at the slab's depth with the zone's mechanism and its dip, not turned to the
 * slab's local dip, which the study does not give for the zone's own earthquakes (a simple
 * choice; the seismogenic depths, when given, still bound it).
 */
export function virtualRupturesAt(
  source: ZoneSource | PointSource,
  magnitude: number,
  magnitudeIndex: number,
  pointContext: (depthKm: number) => RuptureContext,
  strikeCount: number = VIRTUAL_STRIKE_COUNT,
): ((placed: PlacedRupture, out: PlacedRupture[]) => void) | null {
  // A bin's centre a rounding below the threshold (6.499999) counts as at it.
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
      // Ztor and width do not depend on the strike.
      const first = planes[0] as VirtualPlane;
      found = {
        planes,
        context: {
          ...pointContext(hypoDepthKm),
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
    const { planes, context } = atDepth(h.z);
    if (placed.lattice) {
      const p = planes[cellStrikeIndex(placed.lattice, magnitudeIndex, planes.length)];
      out.push(virtualRupture(placed, p as VirtualPlane, placed.share, context));
      return;
    }
    const share = placed.share / planes.length;
    for (const p of planes) out.push(virtualRupture(placed, p, share, context));
  };
}

/** A point placement as the virtual rupture `p` (offsets from its epicentre) with `share`. */
function virtualRupture(
  placed: PlacedRupture,
  p: VirtualPlane,
  share: number,
  context: RuptureContext,
): PlacedRupture {
  const h = placed.surface.hypocentre;
  const [a, b, c, d] = p.corners;
  const plane: RupturePlane = {
    corners: [
      { x: h.x + a.x, y: h.y + a.y, z: a.z },
      { x: h.x + b.x, y: h.y + b.y, z: b.z },
      { x: h.x + c.x, y: h.y + c.y, z: c.z },
      { x: h.x + d.x, y: h.y + d.y, z: d.z },
    ],
  };
  const surface = { kind: 'planes' as const, planes: [plane], hypocentre: h };
  const { sourceIndex, sourceId, cellUse } = placed;
  return cellUse
    ? { sourceIndex, sourceId, share, context, surface, cellUse }
    : { sourceIndex, sourceId, share, context, surface };
}
