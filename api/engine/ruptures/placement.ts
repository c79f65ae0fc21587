import { faultSurface, type FaultSurface } from '../geometry/fault-surface.ts';
import { floatingRuptures, type FloatingRupture } from '../geometry/floating-ruptures.ts';
import type { LocalFrame, PointXY } from '../geometry/projection.ts';
import {
  fitDimensions,
  scaledDimensions,
  scalingRelationFor,
} from '../geometry/rupture-scaling.ts';
import { refineRadiusKm, REFINE_PARTS } from '../geometry/cell-refinement.ts';
import {
  subdivideZoneCell,
  zoneCells,
  type CellLattice,
  type ZoneCell,
} from '../geometry/zone-cells.ts';
import type { FaultSource, PointSource, Settings, Source, ZoneSource } from '../model.ts';
import { pointRuptureContext } from './point-rupture.ts';
import { zoneDepths, type DepthsAt } from './zone-depths.ts';
import type { RuptureContext } from '../motion/types.ts';
import type { Rupture, RuptureSurface } from './rupture.ts';

/** A source's geometry worked out once, ready to place ruptures of any magnitude on. */
export type PreparedSource =
  | {
      readonly kind: 'fault';
      readonly source: FaultSource;
      readonly sourceIndex: number;
      readonly surface: FaultSurface;
      readonly spacingKm: number;
    }
  | {
      readonly kind: 'zone';
      readonly source: ZoneSource;
      readonly sourceIndex: number;
      readonly cells: readonly ZoneCell[];
      /** The squares of the cells refined near a community, by cell index (geometry/cell-refinement.ts). */
      readonly refined: ReadonlyMap<number, readonly ZoneCell[]>;
      readonly refineRadiusKm: number;
      /** Hypocentral depths at a cell centre (zone-depths.ts). */
      readonly depthsAt: DepthsAt;
    }
  | {
      readonly kind: 'point';
      readonly source: PointSource;
      readonly sourceIndex: number;
      readonly location: PointXY;
    };

/**
 * A rupture in place without a rate, its share (0–1) of its magnitude bin's rate, and for a
 * zone's, where its cell lies on the zone's grid (which strike its large earthquakes take,
 * virtual-ruptures.ts).
 */
export type PlacedRupture = Omit<Rupture, 'annualRate'> & {
  readonly share: number;
  readonly lattice?: CellLattice;
};

/**
 * The geometry of `source` in `frame`: a fault surface, zone cells (those near any of `sites`
 * refined, geometry/cell-refinement.ts) with their depths (a zone may take them from another of
 * the study's `sources`, zone-depths.ts), or a point.
 */
export function prepareSource(
  source: Source,
  sourceIndex: number,
  frame: LocalFrame,
  settings: Pick<Settings, 'ruptureSpacingKm' | 'zoneCellKm'>,
  sites: readonly PointXY[] = [],
  sources: readonly Source[] = [],
): PreparedSource {
  if (source.kind === 'fault') {
    return {
      kind: 'fault',
      source,
      sourceIndex,
      surface: faultSurface(source, frame),
      spacingKm: settings.ruptureSpacingKm,
    };
  }
  if (source.kind === 'zone') {
    const cells = zoneCells(source, frame, settings.zoneCellKm);
    const radiusKm = refineRadiusKm(settings.zoneCellKm);
    const refined = new Map<number, readonly ZoneCell[]>();
    cells.forEach((cell, k) => {
      if (sites.some((p) => Math.hypot(p.x - cell.centre.x, p.y - cell.centre.y) <= radiusKm))
        refined.set(k, subdivideZoneCell(source, frame, cell, REFINE_PARTS));
    });
    return {
      kind: 'zone',
      source,
      sourceIndex,
      cells,
      refined,
      refineRadiusKm: radiusKm,
      depthsAt: zoneDepths(source, sources, frame),
    };
  }
  return { kind: 'point', source, sourceIndex, location: frame.toLocal(source.location) };
}

/**
 * Every rupture of a prepared source at `magnitude`, in a fixed order: a fault's floating
 * positions (rows from the top down, each along strike; equal shares), a zone's cells (south
 * row first, west to east; shares by area), or the one point.
 */
export function placeRuptures(prepared: PreparedSource, magnitude: number): PlacedRupture[] {
  const { sourceIndex } = prepared;
  const sourceId = prepared.source.id;
  // Built field by field: object rest and spread here cost more than the geometry (one call per rupture).
  if (prepared.kind === 'fault') {
    const { surface, source } = prepared;
    const scaled = scaledDimensions(
      scalingRelationFor(source.setting, source.mechanism),
      magnitude,
    );
    const positions = floatingRuptures(
      surface,
      fitDimensions(scaled, surface.lengthKm, surface.widthKm),
      { spacingKm: prepared.spacingKm },
    );
    const share = 1 / positions.length;
    const placed: PlacedRupture[] = [];
    for (const p of positions)
      placed.push({
        sourceIndex,
        sourceId,
        share,
        context: faultContext(prepared, magnitude, p),
        surface: faultSurfaceOf(p),
      });
    return placed;
  }
  if (prepared.kind === 'zone') {
    const placed: PlacedRupture[] = [];
    const radiusKm = prepared.refineRadiusKm;
    const contexts = new Map<number, RuptureContext>();
    const contextAt = (depthKm: number): RuptureContext => {
      let context = contexts.get(depthKm);
      if (!context) {
        context = pointRuptureContext(prepared.source, magnitude, depthKm);
        contexts.set(depthKm, context);
      }
      return context;
    };
    // One rupture per depth of the cell (or square), its share split by the depths' weights.
    const place = (at: ZoneCell, cellUse?: PlacedRupture['cellUse']): void => {
      for (const { depthKm, weight } of prepared.depthsAt(at.centre)) {
        const surface = {
          kind: 'point' as const,
          hypocentre: { x: at.centre.x, y: at.centre.y, z: depthKm },
        };
        const share = at.share * weight;
        const context = contextAt(depthKm);
        const { lattice } = at;
        placed.push(
          cellUse
            ? { sourceIndex, sourceId, share, context, surface, cellUse, lattice }
            : { sourceIndex, sourceId, share, context, surface, lattice },
        );
      }
    };
    prepared.cells.forEach((cell, k) => {
      const squares = prepared.refined.get(k);
      if (!squares) {
        place(cell);
        return;
      }
      place(cell, { centre: cell.centre, radiusKm, near: false });
      for (const square of squares) place(square, { centre: cell.centre, radiusKm, near: true });
    });
    return placed;
  }
  const context = pointRuptureContext(prepared.source, magnitude);
  const depthKm = prepared.source.depthKm;
  const { x, y } = prepared.location;
  return [
    {
      sourceIndex,
      sourceId,
      share: 1,
      context,
      surface: { kind: 'point', hypocentre: { x, y, z: depthKm } },
    },
  ];
}

/** The rupture context of a prepared fault's rupture at one floating position. */
function faultContext(
  prepared: PreparedSource & { kind: 'fault' },
  magnitude: number,
  p: FloatingRupture,
): RuptureContext {
  const { source } = prepared;
  return {
    magnitude,
    rakeDeg: source.rakeDeg,
    mechanism: source.mechanism,
    setting: source.setting,
    dipDeg: p.dipDeg,
    ztorKm: p.ztorKm,
    widthKm: p.widthKm,
    hypoDepthKm: p.hypocentre.z,
  };
}

const faultSurfaceOf = (p: FloatingRupture): RuptureSurface =>
  p.tracePlanes === p.planes.length
    ? { kind: 'planes', planes: p.planes, hypocentre: p.hypocentre }
    : { kind: 'planes', planes: p.planes, hypocentre: p.hypocentre, tracePlanes: p.tracePlanes };

/** A rupture (without rate) of a prepared fault at one floating position. */
export function faultRupture(
  prepared: PreparedSource & { kind: 'fault' },
  magnitude: number,
  p: FloatingRupture,
): Omit<Rupture, 'annualRate'> {
  return {
    sourceIndex: prepared.sourceIndex,
    sourceId: prepared.source.id,
    context: faultContext(prepared, magnitude, p),
    surface: faultSurfaceOf(p),
  };
}
