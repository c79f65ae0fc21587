import * as turf from '@turf/turf';
import { positionOffsetsKm } from '../engine/geometry/floating-ruptures.ts';
import {
  fitDimensions,
  scaledDimensions,
  scalingRelationFor,
} from '../engine/geometry/rupture-scaling.ts';
import type { FaultSource, Recurrence, Settings } from '../engine/model.ts';
import { magnitudeEdges } from '../engine/recurrence/magnitude-bins.ts';

/**
 * Bin-centre magnitudes of a recurrence, as recurrence/magnitude-bins.ts makes them; over a
 * logic tree, those of every mMax alternative (tree-magnitude-bins.ts takes their union).
 */
export function binMagnitudes(recurrence: Recurrence, stepM: number): number[] {
  if (recurrence.type === 'fixed') return [recurrence.magnitude];
  const maxima = recurrence.alternatives?.mMax?.map((a) => a.value) ?? [recurrence.mMax];
  const centres = new Set<number>();
  for (const mMax of maxima) {
    const edges = magnitudeEdges(recurrence.mMin, mMax, stepM);
    edges.slice(1).forEach((hi, i) => centres.add(Math.round(((edges[i] as number) + hi) * 5e5)));
  }
  return [...centres].sort((a, b) => a - b).map((k) => k / 1e6);
}

/** First index whose value exceeds `x` in increasing `values` (binary search). */
function firstAbove(values: readonly number[], x: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((values[mid] as number) > x) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/**
 * The rupture planes a fault's floating ruptures will hold: each rupture carries one plane per
 * trace segment it covers (geometry/floating-ruptures.ts), so a trace of many short segments
 * multiplies them. Counted position by position as they will be placed (the same offsets,
 * scaling relation and fit as ruptures/placement.ts), with segment lengths from turf's
 * spherical distance instead of the local frame's, which differ by far less than a segment.
 * Costs one binary search per position, nothing is built.
 */
export function faultPlaneCount(
  source: FaultSource,
  settings: Pick<Settings, 'magnitudeStep' | 'ruptureSpacingKm'>,
): number {
  const ends = [0];
  for (let i = 1; i < source.trace.length; i++) {
    const [a, b] = [source.trace[i - 1] as readonly number[], source.trace[i] as readonly number[]];
    ends.push(
      (ends[i - 1] as number) +
        turf.distance([a[0] as number, a[1] as number], [b[0] as number, b[1] as number], {
          units: 'kilometers',
        }),
    );
  }
  const lengthKm = ends.at(-1) as number;
  const widthKm =
    (source.lowerDepthKm - source.upperDepthKm) / Math.sin((source.dipDeg * Math.PI) / 180);
  // Segment end positions along the trace, without the start (0).
  const segmentEnds = ends.slice(1);
  const relation = scalingRelationFor(source.setting, source.mechanism);
  let planes = 0;
  for (const magnitude of binMagnitudes(source.recurrence, settings.magnitudeStep)) {
    const size = fitDimensions(scaledDimensions(relation, magnitude), lengthKm, widthKm);
    const rows = positionOffsetsKm(widthKm, size.widthKm, settings.ruptureSpacingKm).length;
    let perRow = 0;
    for (const alongKm of positionOffsetsKm(lengthKm, size.lengthKm, settings.ruptureSpacingKm)) {
      const first = Math.min(firstAbove(segmentEnds, alongKm), segmentEnds.length - 1);
      const last = Math.min(
        firstAbove(segmentEnds, alongKm + size.lengthKm - 1e-9),
        segmentEnds.length - 1,
      );
      perRow += last - first + 1;
    }
    planes += rows * perRow;
  }
  return planes;
}
