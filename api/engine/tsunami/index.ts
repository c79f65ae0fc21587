export { fastMarching } from './fast-marching.ts';
export { longWaveGrid } from './long-wave.ts';
export { interfaceSourceArea, startCells } from './source-area.ts';
export { highGround, DEFAULT_HIGH_GROUND_M, SLOW_WALK_MS } from './high-ground.ts';
export {
  tsunamiScreening,
  solveGrids,
  type TsunamiCommunity,
  type TsunamiResult,
} from './tsunami-screening.ts';
export { scenarioTsunami } from './scenario-tsunami.ts';
