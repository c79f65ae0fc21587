export {
  runScenario,
  MAX_SCENARIO_GRID_POINTS,
  type ScenarioRequest,
  type ScenarioResult,
} from './scenario.ts';
export type { ScenarioGrid } from './scenario-grid.ts';
export type { ScenarioPosition } from './scenario-rupture.ts';
