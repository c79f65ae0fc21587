import { contourMesh, type ContourMesh } from '../engine/geometry/contour-mesh.ts';
import { positionOffsetsKm } from '../engine/geometry/floating-ruptures.ts';
import { createLocalFrame } from '../engine/geometry/projection.ts';
import {
  fitDimensions,
  scaledDimensions,
  scalingRelationFor,
} from '../engine/geometry/rupture-scaling.ts';
import type { FaultContours, FaultSource, Settings } from '../engine/model.ts';
import { binMagnitudes } from './fault-plane-estimate.ts';

/** Smallest gap between neighbouring values of an increasing table. */
function smallestStep(table: Float64Array): number {
  let step = Infinity;
  for (let k = 1; k < table.length; k++)
    step = Math.min(step, (table[k] as number) - (table[k - 1] as number));
  return step;
}

/**
 * A contoured fault's mesh as the engine builds it, in a frame centred on the first contour's
 * first point, with its along-strike length and down-dip width (km).
 */
export function contouredExtent(contours: FaultContours): {
  readonly mesh: ContourMesh;
  readonly lengthKm: number;
  readonly widthKm: number;
} {
  const { lines, depthsKm, meshSpacingKm } = contours;
  const frame = createLocalFrame(lines[0]?.[0] ?? [0, 0]);
  const mesh = contourMesh(
    lines.map((line, i) => ({
      points: line.map((p) => frame.toLocal(p)),
      depthKm: depthsKm[i] as number,
    })),
    meshSpacingKm,
  );
  return {
    mesh,
    lengthKm: mesh.alongKm[mesh.columnCount - 1] as number,
    widthKm: mesh.downDipKm[mesh.rowCount - 1] as number,
  };
}

/**
 * The rupture planes a contoured fault's floating ruptures will hold, from above: each rupture
 * is the mesh cells it covers, cut at its edges (engine/geometry/mesh-patch.ts), so at most one
 * more column and row than its size over the mesh's narrowest column and row; flat runs that
 * merge into one plane are not counted off.
 */
export function contouredPlaneCount(
  source: FaultSource & { readonly contours: FaultContours },
  settings: Pick<Settings, 'magnitudeStep' | 'ruptureSpacingKm'>,
): number {
  const { mesh, lengthKm, widthKm } = contouredExtent(source.contours);
  const columnKm = smallestStep(mesh.alongKm);
  const rowKm = smallestStep(mesh.downDipKm);
  const relation = scalingRelationFor(source.setting, source.mechanism);
  const spacingKm = settings.ruptureSpacingKm;
  let planes = 0;
  for (const magnitude of binMagnitudes(source.recurrence, settings.magnitudeStep)) {
    const size = fitDimensions(scaledDimensions(relation, magnitude), lengthKm, widthKm);
    const positions =
      positionOffsetsKm(lengthKm, size.lengthKm, spacingKm).length *
      positionOffsetsKm(widthKm, size.widthKm, spacingKm).length;
    const cells =
      Math.min(mesh.columnCount, Math.ceil(size.lengthKm / columnKm) + 1) *
      Math.min(mesh.rowCount, Math.ceil(size.widthKm / rowKm) + 1);
    planes += positions * cells;
  }
  return planes;
}
