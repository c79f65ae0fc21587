export { createLocalFrame, frameForStudy, type LocalFrame, type PointXY } from './projection.ts';
export { faultSurface, pointOnSurface, surfacePatch, wholeSurface, type FaultSurface, type TraceSegment } from './fault-surface.ts';
export {
  fitDimensions,
  scaledDimensions,
  scalingRelationFor,
  STRASSER_2010_INTERFACE,
  STRASSER_2010_INTRASLAB,
  WELLS_COPPERSMITH_1994,
  type RuptureDimensions,
  type ScalingRelation,
} from './rupture-scaling.ts';
export { endToEndOffsetsKm, floatingRuptures, positionOffsetsKm, type FloatingRupture, type FloatingRupturesOptions } from './floating-ruptures.ts';
export { zoneCells, type ZoneCell } from './zone-cells.ts';
export { ruptureDistances } from './distances.ts';
export { traceCoordinates, ry0FromU, type TraceCoordinates } from './gc2.ts';
export { closestPointOnProjection, distanceToPlaneKm } from './plane-distance.ts';
export { nearestFaults } from './nearest-faults.ts';
