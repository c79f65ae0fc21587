import { bandIntensity } from '../intensity/site-intensity.ts';
import { screeningBand, SCREENING_BANDS } from '../intensity/screening-band.ts';
import type { IntensityConversion } from '../intensity/worden2012.ts';
import type { TectonicSetting } from '../model.ts';
import { ALTERNATIVE_KEYS, type AlternativeKey } from '../recurrence/recurrence-variants.ts';
import type { BandHinge, BandRobustness } from '../results.ts';
import { fractileCurves } from './fractiles.ts';
import type { SourceTreeNode } from './source-tree.ts';
import type { NodeCurves } from './tree-curves.ts';
import { treeDraws } from './tree-combinations.ts';

/** The ground-motion branches of a setting, as the tree needs them. */
export interface TreeBranch {
  readonly model: string;
  readonly weight: number;
}

/** How many choices the band-robustness list names, largest shift first. */
export const HINGE_COUNT = 5;

export interface TreeSummaryOptions {
  readonly nodes: readonly SourceTreeNode[];
  readonly branches: Readonly<Partial<Record<TectonicSetting, readonly TreeBranch[]>>>;
  /** curves[measure][node]: as the fast path gives them (tree-curves.ts). */
  readonly curves: readonly (readonly NodeCurves[])[];
  readonly levelCounts: readonly number[];
  readonly fractiles: readonly number[];
  /** Which measure (index) intensity is read from, its levels and the conversion. */
  readonly intensity: {
    readonly index: number;
    readonly levels: readonly number[];
    readonly conversion: IntensityConversion;
  };
}

export interface TreeSummary {
  /** fractiles[measure]["0.16"]: annual rates per level. */
  readonly fractiles: readonly Record<string, number[]>[];
  readonly robustness: BandRobustness;
}

/**
 * Fractile curves and band robustness over the combined logic tree: each setting's
 * ground-motion branch (one for all its sources, as the mean curves take them) and each
 * source's variant are independent branch points. A combination's curve is the sum of its
 * nodes' curves under its choices; combinations are listed or sampled by tree-combinations.ts.
 */
export function treeSummary(options: TreeSummaryOptions): TreeSummary {
  const { nodes, branches, curves } = options;
  const settings = [...new Set(nodes.map((n) => n.setting))];
  const varied = nodes.map((n, i) => i).filter((i) => nodes[i]!.variantWeights.length > 1);
  const points = [
    ...settings.map((s) => (branches[s] ?? []).map((b) => b.weight)),
    ...varied.map((i) => nodes[i]!.variantWeights),
  ];
  const draws = treeDraws(points);
  const combinationCurve = (m: number, picks: readonly number[]): number[] => {
    const sum = new Array<number>(options.levelCounts[m]!).fill(0);
    nodes.forEach((node, n) => {
      const g = picks[settings.indexOf(node.setting)]!;
      const v = node.variantWeights.length > 1 ? picks[settings.length + varied.indexOf(n)]! : 0;
      const curve = curves[m]![n]![g]![v]!;
      for (let j = 0; j < sum.length; j++) sum[j]! += curve[j]!;
    });
    return sum;
  };
  const fractiles = options.levelCounts.map((levelCount, m) =>
    fractileCurves(
      draws.picks.map((p) => combinationCurve(m, p)),
      draws.weights,
      options.fractiles,
      levelCount,
    ),
  );

  const { index, levels, conversion } = options.intensity;
  const bandOf = (rates: readonly number[]) => {
    const { bandMmi } = bandIntensity(levels, rates, conversion);
    return { mmi475: bandMmi, bandId: screeningBand(bandMmi).id };
  };
  const bandShares: Record<string, number> = Object.fromEntries(
    SCREENING_BANDS.map((b) => [b.id, 0]),
  );
  draws.picks.forEach((p, c) => {
    bandShares[bandOf(combinationCurve(index, p)).bandId]! += draws.weights[c]!;
  });

  return {
    fractiles,
    robustness: {
      bandShares,
      combinations: draws.total,
      sampled: draws.sampled ? draws.picks.length : null,
      hinges: bandHinges(options, settings, bandOf),
    },
  };
}

/** Weighted mean over variants with `keep` of a node's curves under branch g (intensity measure). */
function nodeMean(
  node: SourceTreeNode,
  curves: NodeCurves,
  g: number,
  keep: (v: number) => boolean,
): number[] {
  const perVariant = curves[g]!;
  let weight = 0;
  const sum = new Array<number>(perVariant[0]!.length).fill(0);
  node.variantWeights.forEach((w, v) => {
    if (!keep(v)) return;
    weight += w;
    perVariant[v]!.forEach((r, j) => (sum[j]! += w * r));
  });
  return sum.map((r) => (weight > 0 ? r / weight : 0));
}

/**
 * Switches one choice at a time: the mean hazard with that choice held at each of its
 * alternatives (every other choice at its weights), its 475-year MMI and band. Ranked by the
 * spread of MMI, choices that change the band first.
 */
function bandHinges(
  options: TreeSummaryOptions,
  settings: readonly TectonicSetting[],
  bandOf: (rates: readonly number[]) => { mmi475: number | null; bandId: string },
): BandHinge[] {
  const { nodes, branches } = options;
  const curves = options.curves[options.intensity.index]!;
  const all = () => true;
  const add = (a: number[], b: readonly number[], w: number): void => {
    for (let j = 0; j < a.length; j++) a[j]! += w * b[j]!;
  };
  const levelCount = options.intensity.levels.length;
  // A setting's mean with its ground-motion weights, optionally one branch alone or one node replaced.
  const meanCurve = (override?: {
    setting?: TectonicSetting;
    branch?: number;
    node?: number;
    keep?: (v: number) => boolean;
  }): number[] => {
    const total = new Array<number>(levelCount).fill(0);
    nodes.forEach((node, n) => {
      const list = branches[node.setting] ?? [];
      const keep = override?.node === n ? override.keep! : all;
      list.forEach((b, g) => {
        if (override?.setting === node.setting && override.branch !== g) return;
        const w = override?.setting === node.setting ? 1 : b.weight;
        add(total, nodeMean(node, curves[n]!, g, keep), w);
      });
    });
    return total;
  };
  const hinges: BandHinge[] = [];
  const hinge = (
    base: Omit<BandHinge, 'mmiShift' | 'changesBand' | 'alternatives'>,
    alternatives: { value: string; weight: number; rates: number[] }[],
  ): void => {
    const rows = alternatives.map((a) => ({
      value: a.value,
      weight: a.weight,
      ...bandOf(a.rates),
    }));
    const mmis = rows.map((r) => r.mmi475 ?? 0);
    hinges.push({
      ...base,
      mmiShift: Math.max(...mmis) - Math.min(...mmis),
      changesBand: new Set(rows.map((r) => r.bandId)).size > 1,
      alternatives: rows,
    });
  };
  for (const setting of settings) {
    const list = branches[setting] ?? [];
    if (list.length < 2) continue;
    hinge(
      { choice: 'groundMotion', setting },
      list.map((b, g) => ({
        value: b.model,
        weight: b.weight,
        rates: meanCurve({ setting, branch: g }),
      })),
    );
  }
  nodes.forEach((node, n) => {
    if (!node.source) return;
    for (const key of ALTERNATIVE_KEYS as readonly AlternativeKey[]) {
      const list = node.source.alternatives[key];
      if (!list || list.length < 2) continue;
      hinge(
        {
          choice: key,
          setting: node.setting,
          sourceId: node.source.id,
          sourceName: node.source.name,
        },
        list.map((a, i) => ({
          value: String(a.value),
          weight: a.weight,
          rates: meanCurve({ node: n, keep: (v) => node.choices[v]![key] === i }),
        })),
      );
    }
  });
  return hinges
    .sort((a, b) => Number(b.changesBand) - Number(a.changesBand) || b.mmiShift - a.mmiShift)
    .slice(0, HINGE_COUNT);
}
