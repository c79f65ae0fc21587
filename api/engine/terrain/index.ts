export {
  createElevationGrid,
  elevationAt,
  elevationSampler,
  gridCoordinates,
  gridOutline,
  gridToLonLat,
  type ElevationGrid,
  type ElevationGridInit,
  type GridCrs,
  type ToGridCoordinates,
} from './elevation-grid.ts';
