export { erfc, normalCdf, normalSurvival } from './normal-cdf.ts';
export { exceedanceProbability, standardisedLevel } from './truncated-exceedance.ts';
export { DEFAULT_LEVEL_COUNT, defaultLevels, levelsFor } from './hazard-levels.ts';
export { gmmInput, predictRuptures, selectRuptures, type RupturePredictions } from './rupture-predictions.ts';
export { exceedanceCurve } from './exceedance-curve.ts';
export { branchCombinationCount, branchCombinationCurves, MAX_BRANCH_COMBINATIONS, meanHazard, type SettingBranchCurve } from './logic-tree.ts';
export { siteHazard, type HazardBranch, type HazardMeasure, type SiteBranchHazard, type SiteHazard, type SiteHazardOptions, type ValiditySummary } from './site-hazard.ts';
export { annualRateForProbability, poissonProbability, returnPeriodForProbability } from './poisson.ts';
export { annualRateAtLevel, levelAtAnnualRate, levelAtReturnPeriod, type CurveLevel, type CurveRate } from './curve-interpolation.ts';
export { deaggregate, type DeaggregationBranch, type DeaggregationOptions } from './deaggregation.ts';
export { DISTANCE_EDGES_KM, EPSILON_EDGES, MAGNITUDE_BIN_WIDTH } from './deaggregation-bins.ts';
// The fast path (typed arrays; the reference path above stays as the check).
export { MECHANISMS, PLANE_STRIDE, ruptureContexts, settingRuptures, type RuptureTable } from './rupture-table.ts';
export { ruptureTable, RuptureTableBuilder } from './rupture-table-builder.ts';
export { studyRuptureTable, type StudyRuptureTable } from './study-rupture-table.ts';
export { createFastHazard, fastSiteHazard, type FastHazard, type FastHazardOptions, type FastSite, type FastSiteHazard } from './fast-site-hazard.ts';
export { createFastRates, fastSiteRates, type FastRates, type SiteRates } from './fast-site-rates.ts';
export { fastDeaggregate, type FastDeaggregationOptions } from './fast-deaggregation.ts';
