import { faultSurface } from '../geometry/fault-surface.ts';
import type { LocalFrame } from '../geometry/projection.ts';
import { TECTONIC_SETTINGS } from '../model.ts';
import type { RecurrenceAlternatives, Study, TectonicSetting } from '../model.ts';
import { variantCount, type AlternativeKey } from '../recurrence/recurrence-variants.ts';
import { treeMagnitudeBins } from '../recurrence/tree-magnitude-bins.ts';
import { settingRuptures, type RuptureTable } from './rupture-table.ts';

/**
 * One node of the source-model logic tree within a setting: a source with alternatives, or
 * every source of the setting without them (one variant, the table's rates). Rupture indices
 * are local to the setting (the order of settingRuptures), as the fast path's pairs are.
 */
export interface SourceTreeNode {
  readonly setting: TectonicSetting;
  /** The source with alternatives; null for the setting's sources without. */
  readonly source: {
    readonly id: string;
    readonly name: string;
    readonly alternatives: RecurrenceAlternatives;
  } | null;
  readonly ruptures: Int32Array;
  /** The node holds every rupture of its setting at the table's rates: its curve is the setting's. */
  readonly whole: boolean;
  readonly variantWeights: readonly number[];
  /** variantRates[v][k]: annual rate of rupture ruptures[k] under variant v. */
  readonly variantRates: readonly Float64Array[];
  /** The alternative each variant takes of each varied parameter (recurrence-variants.ts). */
  readonly choices: readonly Readonly<Partial<Record<AlternativeKey, number>>>[];
}

/** Key of a magnitude in the bins' maps (tree-magnitude-bins.ts rounds the same way). */
const key = (m: number): number => Math.round(m * 1e6);

/**
 * The study's source-model logic tree over its rupture table: per setting with ruptures, one
 * node per source with alternatives and one for the rest. A rupture's rate under a variant is
 * its table rate (the weighted mean over the variants, ruptures/discretise.ts) times the
 * variant's bin rate over the mean bin rate at its magnitude: the share of the bin it holds
 * does not depend on the variant.
 */
export function sourceTree(study: Study, table: RuptureTable, frame: LocalFrame): SourceTreeNode[] {
  const nodes: SourceTreeNode[] = [];
  for (const setting of TECTONIC_SETTINGS) {
    const ruptures = settingRuptures(table, setting);
    if (ruptures.length === 0) continue;
    const bySource = new Map<number, number[]>();
    const fixed: number[] = [];
    ruptures.forEach((i, local) => {
      const s = table.sourceIndex[i] as number;
      const source = study.sources[s];
      if (source && variantCount(source.recurrence) > 1) {
        const list = bySource.get(s) ?? [];
        list.push(local);
        bySource.set(s, list);
      } else fixed.push(local);
    });
    if (fixed.length > 0 || bySource.size === 0) {
      const local = Int32Array.from(fixed);
      nodes.push({
        setting,
        source: null,
        ruptures: local,
        whole: bySource.size === 0,
        variantWeights: [1],
        variantRates: [Float64Array.from(local, (k) => table.annualRate[ruptures[k]!] as number)],
        choices: [{}],
      });
    }
    for (const [s, locals] of bySource) {
      const source = study.sources[s]!;
      const areaKm2 = source.kind === 'fault' ? faultSurface(source, frame).areaKm2 : undefined;
      const bins = treeMagnitudeBins(source.recurrence, study.settings, areaKm2);
      const binIndex = new Map(bins.magnitudes.map((m, i) => [key(m), i]));
      const variantRates = bins.variants.map((_, v) =>
        Float64Array.from(locals, (local) => {
          const i = ruptures[local] as number;
          const b = binIndex.get(key(table.magnitude[i] as number));
          const mean = b === undefined ? 0 : (bins.annualRates[b] as number);
          if (b === undefined || mean === 0) return 0;
          return ((table.annualRate[i] as number) * (bins.variantRates[v]![b] as number)) / mean;
        }),
      );
      nodes.push({
        setting,
        source: { id: source.id, name: source.name, alternatives: source.recurrence.alternatives! },
        ruptures: Int32Array.from(locals),
        whole: false,
        variantWeights: bins.variants.map((v) => v.weight),
        variantRates,
        choices: bins.variants.map((v) => v.choices),
      });
    }
  }
  return nodes;
}
