export { runScenario, MAX_SCENARIO_GRID_POINTS, type ScenarioRequest, type ScenarioResult, type ScenarioCommunity } from './scenario.ts';
export { siteMotions, type ScenarioMotion, type SiteMotionOptions } from './site-motions.ts';
export { scenarioGrid, type ScenarioGrid } from './scenario-grid.ts';
export type { ScenarioPosition } from './scenario-rupture.ts';
