import type { TectonicSetting } from '../model.ts';
import { createPairPredictions } from '../motion/prepared-period.ts';
import type { PairPredictions } from '../motion/types.ts';
import {
  accumulatePairs,
  createCurveAccumulator,
  curveRates,
  resetCurveAccumulator,
  type CurveAccumulator,
} from './curve-accumulator.ts';
import type { ExceedanceTable } from './exceedance-table.ts';
import type { SourceTreeNode } from './source-tree.ts';

/** One node's curves at a site for one measure: [ground-motion branch][variant] → annual rates per level. */
export type NodeCurves = number[][][];

/**
 * The source-tree nodes of one setting on the fast path, with scratch space: each node's pairs
 * are gathered into their own short arrays (pair → the rupture's position in the node), so
 * every variant's sum visits that node's pairs only, with the variant's rates as they are.
 */
export interface TreeSettingWork {
  /** The nodes of this setting and their indices in the whole tree. */
  readonly nodes: readonly { readonly node: SourceTreeNode; readonly index: number }[];
  /** Node (position in `nodes`) and position within it of each setting-local rupture. */
  readonly nodeOf: Int32Array;
  readonly positionInNode: Int32Array;
  readonly pairRupture: Int32Array;
  readonly predictions: PairPredictions;
  /** One per measure. */
  readonly curves: readonly CurveAccumulator[];
}

export function createTreeSettingWork(
  tree: readonly SourceTreeNode[],
  setting: TectonicSetting,
  ruptureCount: number,
  levelsByMeasure: readonly (readonly number[])[],
): TreeSettingWork {
  const nodes = tree.flatMap((node, index) => (node.setting === setting ? [{ node, index }] : []));
  const nodeOf = new Int32Array(ruptureCount).fill(-1);
  const positionInNode = new Int32Array(ruptureCount);
  nodes.forEach(({ node }, n) =>
    node.ruptures.forEach((local, k) => {
      nodeOf[local] = n;
      positionInNode[local] = k;
    }),
  );
  return {
    nodes,
    nodeOf,
    positionInNode,
    pairRupture: new Int32Array(ruptureCount),
    predictions: createPairPredictions(ruptureCount),
    curves: levelsByMeasure.map((levels) => createCurveAccumulator(levels)),
  };
}

/**
 * Each node's curve under each of its variants for one branch and measure at the current site
 * (Σ rate × P(IM > level) over the node's pairs, as curve-accumulator.ts sums it). A node
 * holding the whole setting at the table's rates takes `settingCurve`, already summed.
 * `out[index][branch]` receives the node's variant curves.
 */
export function accumulateTreeNodes(
  work: TreeSettingWork,
  measureIndex: number,
  branch: number,
  settingCurve: readonly number[],
  exceedance: ExceedanceTable,
  pairRupture: Int32Array,
  prediction: PairPredictions,
  count: number,
  out: NodeCurves[],
): void {
  const acc = work.curves[measureIndex] as CurveAccumulator;
  for (let n = 0; n < work.nodes.length; n++) {
    const { node, index } = work.nodes[n]!;
    const curves = (out[index] ??= []);
    if (node.whole) {
      curves[branch] = [settingCurve.slice()];
      continue;
    }
    let kept = 0;
    for (let k = 0; k < count; k++) {
      const local = pairRupture[k] as number;
      if (work.nodeOf[local] !== n) continue;
      work.pairRupture[kept] = work.positionInNode[local] as number;
      work.predictions.lnMedian[kept] = prediction.lnMedian[k] as number;
      work.predictions.sigma[kept] = prediction.sigma[k] as number;
      kept++;
    }
    curves[branch] = node.variantRates.map((rates) => {
      resetCurveAccumulator(acc);
      // The predictions were checked finite when the setting's curve was summed.
      accumulatePairs(acc, exceedance, {
        rates,
        pairRupture: work.pairRupture,
        predictions: work.predictions,
        count: kept,
      });
      return curveRates(acc);
    });
  }
}
