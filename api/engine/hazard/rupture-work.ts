import type { LocalFrame } from '../geometry/projection.ts';
import type { Study } from '../model.ts';
import type { RuptureTable } from './rupture-table.ts';
import { sourceTree } from './source-tree.ts';

/** What a study's rupture table asks of every site, for the work budget (operations/work-budget.ts). */
export interface RuptureWork {
  readonly ruptures: number;
  /**
   * Planes beyond the first of each rupture: a contoured fault's rupture has one per mesh cell
   * (geometry/mesh-patch.ts), a planar fault's one per trace segment it covers; each costs a
   * distance at every site.
   */
  readonly extraPlanes: number;
  /**
   * Ruptures summed again per variant of the source-model logic tree: each source with
   * alternatives has its ruptures summed once per variant at every site (tree-curves.ts).
   */
  readonly variantRuptures: number;
}

/** The work of `table` (the study's, in `frame`): its ruptures, extra planes and per-variant sums. */
export function ruptureWork(study: Study, table: RuptureTable, frame: LocalFrame): RuptureWork {
  const planes = table.planeStart[table.count] as number;
  let withPlanes = 0;
  for (let i = 0; i < table.count; i++) if (table.isPoint[i] === 0) withPlanes++;
  let variantRuptures = 0;
  for (const node of sourceTree(study, table, frame))
    if (node.source) variantRuptures += node.variantRates.length * node.ruptures.length;
  return { ruptures: table.count, extraPlanes: planes - withPlanes, variantRuptures };
}
