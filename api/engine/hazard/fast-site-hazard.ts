import { TremoraError } from '../errors.ts';
import type { PointXY } from '../geometry/projection.ts';
import { TECTONIC_SETTINGS } from '../model.ts';
import type { TectonicSetting } from '../model.ts';
import { measureLabel } from '../motion/measure.ts';
import { createPairPredictions } from '../motion/prepared-period.ts';
import type {
  DistanceName,
  PairDistances,
  PairPredictions,
  RuptureContext,
  SiteContext,
} from '../motion/types.ts';
import type { HazardCurve } from '../results.ts';
import {
  accumulatePairs,
  createCurveAccumulator,
  curveRates,
  resetCurveAccumulator,
  type CurveAccumulator,
} from './curve-accumulator.ts';
import { exceedanceTable, type ExceedanceTable } from './exceedance-table.ts';
import { MAX_BRANCH_COMBINATIONS, treeHazardCurve, type SettingBranchCurve } from './logic-tree.ts';
import { pairDistanceContext, preparedMotions, type LazyMotions } from './prepared-motion.ts';
import { gmmInput } from './gmm-input.ts';
import { distinctContexts, settingRuptures, type RuptureTable } from './rupture-table.ts';
import type {
  HazardBranch,
  HazardIntegralOptions,
  HazardMeasure,
  ValiditySummary,
} from './hazard-types.ts';
import { ruptureGeometry, type RuptureGeometry } from './rupture-geometry.ts';
import { countsOf, validitySummaries, type ValidityCounts } from './validity-counts.ts';
import { createPairBuffer, siteDistances, type PairBuffer } from './site-distances.ts';
import type { SourceTreeNode } from './source-tree.ts';
import {
  accumulateTreeNodes,
  createTreeSettingWork,
  type NodeCurves,
  type TreeSettingWork,
} from './tree-curves.ts';

/**
 * The hazard integral at one site (classical PSHA over each setting's ruptures within the
 * cut-off, every branch, every measure, then the logic tree of logic-tree.ts; checked against
 * the plain sum in test/helpers/reference-hazard/) from the rupture table, with each model's site-independent work
 * done once per study (GroundMotionModel.prepare), one model evaluation per pair and measure,
 * and all levels read from it (curve-accumulator.ts). Scratch buffers are reused from site to
 * site, so one FastHazard serves one thread's sites in turn.
 */

export interface FastHazardOptions extends HazardIntegralOptions {
  readonly table: RuptureTable;
  /** Keep each branch's predictions of the first measure and each pair's Rrup, for deaggregation. */
  readonly keepFirstMeasure?: boolean;
  /** Per-branch curves besides the mean (true by default; a map needs only the mean). */
  readonly branchCurves?: boolean;
  /** The source-model logic tree (source-tree.ts): each node's curves are kept per branch and variant. */
  readonly sourceTree?: readonly SourceTreeNode[];
}

/** One branch of one setting on the fast path: its model's predictor of every measure, and curve sums, one per measure. */
export interface BranchWork {
  readonly model: HazardBranch['model'];
  readonly weight: number;
  readonly motions: LazyMotions;
  /** One per measure. */
  readonly curves: readonly CurveAccumulator[];
}

/** One setting's ruptures on the fast path, with the scratch buffers of its pairs at the current site. */
export interface SettingWork {
  readonly setting: TectonicSetting;
  readonly ruptures: Int32Array;
  readonly rates: Float64Array;
  /** The distinct contexts of the ruptures (the models are prepared on these) and each rupture's. */
  readonly contexts: readonly RuptureContext[];
  readonly contextOf: Int32Array;
  readonly branches: readonly BranchWork[];
  readonly distances: ReadonlySet<DistanceName>;
  readonly pairs: PairBuffer;
  /** The same pairs as the models see them: the same distance columns, each pair's context for its rupture. */
  readonly contextPairs: PairBuffer;
  /** One per measure. */
  readonly predictions: readonly PairPredictions[];
  readonly tree?: TreeSettingWork;
}

export interface FastHazard {
  readonly options: FastHazardOptions;
  readonly geometry: RuptureGeometry;
  readonly exceedance: ExceedanceTable;
  readonly settings: readonly SettingWork[];
}

/** Prepares the fast path for a study's rupture table, branches and measures. */
export function createFastHazard(options: FastHazardOptions): FastHazard {
  const { table } = options;
  const settings: SettingWork[] = [];
  for (const setting of TECTONIC_SETTINGS) {
    const given = options.branches[setting];
    if (!given || given.length === 0) continue;
    const ruptures = settingRuptures(table, setting);
    const { contexts, contextOf } = distinctContexts(table, ruptures);
    const measures = options.measures.map((m) => m.measure);
    const branches = given.map(({ model, weight }) => ({
      model,
      weight,
      motions: preparedMotions(model, contexts, measures),
      curves: options.measures.map((m) => createCurveAccumulator(m.levels)),
    }));
    const distances = new Set<DistanceName>(branches.flatMap((b) => b.motions.distances));
    if (options.keepFirstMeasure) distances.add('rrupKm');
    const pairs = createPairBuffer(ruptures.length);
    settings.push({
      setting,
      ruptures,
      rates: ruptures.length === 0 ? new Float64Array(0) : gather(table.annualRate, ruptures),
      contexts,
      contextOf,
      branches,
      distances,
      pairs,
      contextPairs: { ...pairs, rupture: new Int32Array(ruptures.length) },
      predictions: options.measures.map(() => createPairPredictions(ruptures.length)),
      ...(options.sourceTree
        ? {
            tree: createTreeSettingWork(
              options.sourceTree,
              setting,
              ruptures.length,
              options.measures.map((m) => m.levels),
            ),
          }
        : {}),
    });
  }
  return {
    options,
    geometry: ruptureGeometry(table),
    exceedance: exceedanceTable(options.truncationSigma),
    settings,
  };
}

/**
 * The setting's pairs at site `at` (its ruptures within reach, by siteDistances, into
 * `work.pairs`) as the models see them: each pair's rupture replaced by its context's index.
 * The distance columns are the pairs' own.
 */
export function pairsAtSite(hazard: FastHazard, work: SettingWork, at: FastSite): PairDistances {
  const { pairs, contextPairs, contextOf } = work;
  siteDistances(
    {
      geometry: hazard.geometry,
      ruptures: work.ruptures,
      site: at.point,
      maxDistanceKm: hazard.options.maxDistanceKm,
      distances: work.distances,
    },
    pairs,
  );
  for (let k = 0; k < pairs.count; k++)
    contextPairs.rupture[k] = contextOf[pairs.rupture[k] as number] as number;
  contextPairs.count = pairs.count;
  return contextPairs;
}

/** values[indices[k]] for each k. */
function gather(values: Float64Array, indices: Int32Array): Float64Array {
  const out = new Float64Array(indices.length);
  for (let k = 0; k < indices.length; k++) out[k] = values[indices[k] as number] as number;
  return out;
}

/** A site of the fast path: where it is in the study's local frame (km) and its ground. */
export interface FastSite {
  readonly point: PointXY;
  readonly site: SiteContext;
}

/** One branch's predictions of the first measure at one site, for deaggregation. */
export interface BranchPredictions {
  readonly weight: number;
  /** Table index of each pair's rupture. */
  readonly ruptureIndex: Int32Array;
  readonly lnMedian: Float64Array;
  readonly sigma: Float64Array;
  readonly rrupKm: Float64Array;
}

export interface FastSiteHazard {
  /** Mean curve (with per-branch curves unless omitted) by measure key. */
  readonly curves: Readonly<Record<string, HazardCurve>>;
  readonly branchCurvesOmitted: boolean;
  readonly validity: readonly ValiditySummary[];
  /** Filled when FastHazardOptions.keepFirstMeasure is set; branches in setting order, then in the study's order. */
  readonly firstMeasure: readonly BranchPredictions[];
  /** With FastHazardOptions.sourceTree: treeCurves[measure][node] (node as in the tree). */
  readonly treeCurves?: readonly (readonly NodeCurves[])[];
}

/** Hazard curves at one site; `afterBranch` is called after each branch (it may throw to stop). */
export function fastSiteHazard(
  hazard: FastHazard,
  at: FastSite,
  afterBranch?: () => void,
): FastSiteHazard {
  const { options, exceedance } = hazard;
  const { measures } = options;
  const validity: ValidityCounts = new Map();
  const settingCurves: SettingBranchCurve[][] = measures.map(() => []);
  const firstMeasure: BranchPredictions[] = [];
  const treeCurves: NodeCurves[][] | undefined = options.sourceTree
    ? measures.map(() => [])
    : undefined;

  for (const work of hazard.settings) {
    const { pairs, predictions } = work;
    const modelPairs = pairsAtSite(hazard, work, at);
    const count = pairs.count;
    let ruptureIndex: Int32Array | undefined;
    if (options.keepFirstMeasure) {
      ruptureIndex = new Int32Array(count);
      for (let k = 0; k < count; k++)
        ruptureIndex[k] = work.ruptures[pairs.rupture[k] as number] as number;
    }
    const rrupKm = options.keepFirstMeasure ? pairs.rrupKm.slice(0, count) : undefined;

    work.branches.forEach((branch, branchIndex) => {
      const summary = countsOf(validity, branch.model.name);
      if (count > 0) branch.motions.predict(at.site, modelPairs, predictions);
      measures.forEach((m, i) => {
        const curve = branch.curves[i] as CurveAccumulator;
        const prediction = predictions[i] as PairPredictions;
        resetCurveAccumulator(curve);
        if (count > 0) {
          const bad = accumulatePairs(curve, exceedance, {
            rates: work.rates,
            pairRupture: pairs.rupture,
            predictions: prediction,
            count,
          });
          if (bad >= 0)
            throw unusablePrediction(
              hazard,
              work,
              branch,
              i,
              bad,
              prediction.lnMedian[bad],
              prediction.sigma[bad],
            );
        }
        summary.evaluated += count;
        const firstOutside = prediction.applicable.subarray(0, count).indexOf(0);
        if (firstOutside >= 0) {
          for (let k = firstOutside; k < count; k++)
            if (prediction.applicable[k] === 0) summary.outside++;
          if (!summary.firstNote)
            summary.firstNote = noteOf(hazard, work, branch, i, at, firstOutside);
        }
        if (i === 0 && ruptureIndex && rrupKm) {
          firstMeasure.push({
            weight: branch.weight,
            ruptureIndex,
            lnMedian: prediction.lnMedian.slice(0, count),
            sigma: prediction.sigma.slice(0, count),
            rrupKm,
          });
        }
        const annualRate = curveRates(curve);
        settingCurves[i]!.push({
          setting: work.setting,
          model: branch.model.name,
          weight: branch.weight,
          annualRate,
        });
        if (work.tree && treeCurves)
          accumulateTreeNodes(
            work.tree,
            i,
            branchIndex,
            annualRate,
            exceedance,
            pairs.rupture,
            prediction,
            count,
            treeCurves[i]!,
          );
      });
      afterBranch?.();
    });
  }

  const cap = options.maxBranchCombinations ?? MAX_BRANCH_COMBINATIONS;
  let branchCurvesOmitted = false;
  const curves: Record<string, HazardCurve> = {};
  measures.forEach((m, i) => {
    const list = settingCurves[i] as SettingBranchCurve[];
    const { curve, branchesOmitted } = treeHazardCurve(
      list,
      m.levels,
      options.branchCurves === false ? null : cap,
    );
    if (branchesOmitted) branchCurvesOmitted = true;
    curves[m.key] = curve;
  });
  return {
    curves,
    branchCurvesOmitted,
    validity: validitySummaries(validity),
    firstMeasure,
    ...(treeCurves ? { treeCurves } : {}),
  };
}

/** The error for pair k, whose prediction is not a finite ln median with a finite σ >= 0. */
export function unusablePrediction(
  hazard: FastHazard,
  work: SettingWork,
  branch: BranchWork,
  measureIndex: number,
  k: number,
  lnMedian: number | undefined,
  sigma: number | undefined,
): TremoraError {
  const { table, measures } = hazard.options;
  const source = table.sourceIndex[work.ruptures[work.pairs.rupture[k] as number] as number];
  const measure = (measures[measureIndex] as HazardMeasure).measure;
  return new TremoraError(
    `${branch.model.name} gave ln median ${lnMedian} and sigma ${sigma} for ${measureLabel(measure)} ` +
      `from a rupture of source "${table.sourceIds[source as number]}"; expected finite numbers with sigma >= 0`,
  );
}

/** The first validity note of pair k, from the model's own predict() (as the reference path reports it). */
export function noteOf(
  hazard: FastHazard,
  work: SettingWork,
  branch: BranchWork,
  measureIndex: number,
  at: FastSite,
  k: number,
): string {
  const local = work.pairs.rupture[k] as number;
  const distances = pairDistanceContext(hazard.geometry, work.ruptures[local] as number, at.point);
  const measure = (hazard.options.measures[measureIndex] as HazardMeasure).measure;
  const prediction = branch.model.predict(
    gmmInput(work.contexts[work.contextOf[local] as number]!, distances, at.site),
    measure,
  );
  return prediction.notes[0] ?? `${branch.model.name}: outside its validity range`;
}
