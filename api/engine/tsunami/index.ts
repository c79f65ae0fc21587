export { fastMarching, type FastMarchingGrid, type StartCell } from './fast-marching.ts';
export { longWaveGrid, longWaveSpeedMS, MIN_DEPTH_M } from './long-wave.ts';
export { metricGrid, nativeCellKm, MAX_METRIC_CELLS, type MetricGrid } from './metric-grid.ts';
export { interfaceSourceArea, ruptureArea, startCells, type SourceArea } from './source-area.ts';
export { coastArrival, COAST_BAND_KM, COAST_SEARCH_KM, MODEL_ALLOWANCE, type CoastArrival, type TravelTimes } from './coast-arrival.ts';
export { highGround, DEFAULT_HIGH_GROUND_M, HIGH_GROUND_SEARCH_KM, SLOW_WALK_MS, type HighGround } from './high-ground.ts';
export {
  arrivalsFromAreas,
  tsunamiScreening,
  solveGrids,
  type SolveGrids,
  MIN_SOLVE_SPACING_KM,
  type SourceArrival,
  type TsunamiCommunity,
  type TsunamiOptions,
  type TsunamiResult,
} from './tsunami-screening.ts';
export { scenarioTsunami } from './scenario-tsunami.ts';
