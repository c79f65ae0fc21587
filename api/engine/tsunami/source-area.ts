import { booleanPointInPolygon, polygon } from '@turf/turf';
import { InvalidInput } from '../errors.ts';
import { faultSurface, wholeSurface } from '../geometry/fault-surface.ts';
import type { LocalFrame, PointXY } from '../geometry/projection.ts';
import type { Source } from '../model.ts';
import type { RuptureSurface } from '../ruptures/rupture.ts';
import type { StartCell } from './fast-marching.ts';
import { cellCentre, cellIndexAt, type MetricGrid } from './metric-grid.ts';

/**
 * Where a tsunami starts: the surface projection of a rupture, as polygons of the local frame
 * (km). The sea over it (offshore of the study's outline, startCells) is taken as raised at once
 * when the rupture stops, so the wave leaves every such water cell at time zero: the usual start of a first-arrival estimate for a
 * near-field source, whose rupture lasts a minute or two and which this ignores.
 */
export interface SourceArea {
  readonly sourceId: string;
  readonly name: string;
  readonly footprints: readonly (readonly PointXY[])[];
}

/** The surface projection of a rupture surface: one quadrilateral per plane. */
export function ruptureArea(sourceId: string, name: string, surface: RuptureSurface): SourceArea {
  if (surface.kind === 'point') {
    throw new InvalidInput([
      {
        path: 'sourceId',
        message: `source "${sourceId}" has a point rupture, with no area for a tsunami to start from; expected a fault or zone interface source`,
      },
    ]);
  }
  return {
    sourceId,
    name,
    footprints: surface.planes.map((p) => p.corners.map(({ x, y }) => ({ x, y }))),
  };
}

/**
 * The area of a whole interface source: its fault surface projected to the ground, or its zone
 * polygon. The largest earthquakes of an interface break most of it, and the earliest arrival
 * from any rupture on it comes from some part of this area.
 */
export function interfaceSourceArea(source: Source, frame: LocalFrame): SourceArea {
  if (source.kind === 'fault')
    return ruptureArea(source.id, source.name, wholeSurface(faultSurface(source, frame)));
  if (source.kind === 'zone')
    return {
      sourceId: source.id,
      name: source.name,
      footprints: [(source.rings[0] ?? []).map((p) => frame.toLocal(p))],
    };
  return ruptureArea(source.id, source.name, {
    kind: 'point',
    hypocentre: { ...frame.toLocal(source.location), z: source.depthKm },
  });
}

/** A polygon ready for many point-in-polygon tests: its turf shape and bounding box (local km). */
interface BoxedPolygon {
  readonly shape: ReturnType<typeof polygon>;
  readonly west: number;
  readonly east: number;
  readonly south: number;
  readonly north: number;
}

function boxed(ring: readonly PointXY[]): BoxedPolygon {
  return {
    shape: polygon([
      [...ring.map((p) => [p.x, p.y]), [(ring[0] as PointXY).x, (ring[0] as PointXY).y]],
    ]),
    west: Math.min(...ring.map((p) => p.x)),
    east: Math.max(...ring.map((p) => p.x)),
    south: Math.min(...ring.map((p) => p.y)),
    north: Math.max(...ring.map((p) => p.y)),
  };
}

const inAny = (polygons: readonly BoxedPolygon[], x: number, y: number): boolean =>
  polygons.some(
    (p) =>
      x >= p.west &&
      x <= p.east &&
      y >= p.south &&
      y <= p.north &&
      booleanPointInPolygon([x, y], p.shape),
  );

/**
 * The water cells (elevation below 0 m) whose centres lie in the area and offshore of `land`
 * (the study's outline rings, local km), each starting at time zero. Only the sea floor over a
 * rupture lifts the sea: where an interface runs on under the land, the inlets, harbours and
 * lagoons inside the outline lie over the rupture too, but the water they hold is not the
 * source (it would put the start at the villages' own shore). The whole area must lie on the
 * terrain: a corner off the grid or on missing data means the grid does not cover the source,
 * and an area with no water cell offshore cannot start a tsunami.
 */
export function startCells(
  m: MetricGrid,
  area: SourceArea,
  terrainLabel: string,
  toLonLat: (p: PointXY) => readonly [number, number],
  land: readonly (readonly PointXY[])[] = [],
): StartCell[] {
  for (const footprint of area.footprints) {
    for (const corner of footprint) {
      const index = cellIndexAt(m, corner);
      if (index < 0 || Number.isNaN(m.elevationM[index])) {
        const [lon, lat] = toLonLat(corner);
        throw new InvalidInput([
          {
            path: 'terrain',
            message: `the terrain grid "${terrainLabel}" does not cover the rupture area of source "${area.sourceId}": its corner at lon ${lon.toFixed(3)}, lat ${lat.toFixed(3)} is off the grid or on missing data; expected a grid covering the whole source`,
          },
        ]);
      }
    }
  }
  const footprints = area.footprints.map(boxed);
  const shores = land.filter((ring) => ring.length >= 3).map(boxed);
  const cells: StartCell[] = [];
  for (let index = 0; index < m.elevationM.length; index += 1) {
    if (!((m.elevationM[index] as number) < 0)) continue;
    const { x, y } = cellCentre(m, index);
    if (inAny(footprints, x, y) && !inAny(shores, x, y)) cells.push({ index, timeS: 0 });
  }
  if (cells.length === 0) {
    throw new InvalidInput([
      {
        path: 'terrain',
        message: `the rupture area of source "${area.sourceId}" has no sea on the terrain grid "${terrainLabel}" offshore of the study's outline; expected part of it under the sea`,
      },
    ]);
  }
  return cells;
}
