export type { PointKm, Rupture, RupturePlane, RuptureSurface } from './rupture.ts';
export { discretiseSource, discretiseStudy, rupturesAtMagnitude, visitSourceRuptures, type DiscretisedStudy } from './discretise.ts';
export { placeRuptures, prepareSource, type PlacedRupture, type PreparedSource } from './placement.ts';
export { POINT_DIP_DEG, pointRuptureContext } from './point-rupture.ts';
