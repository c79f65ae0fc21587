import type { Source } from '../../api/engine/model.ts';
import type { ZoneDepthReport } from '../../api/engine/results.ts';

/** One zone's depths in a line of the overview's table. */
export interface ZoneDepthSummary {
  readonly sourceId: string;
  readonly name: string;
  readonly cells: number;
  /** Over every depth of every cell (a cell given a list of depths counts each of them), km. */
  readonly shallowestKm: number;
  readonly medianKm: number;
  readonly deepestKm: number;
  /** The surface the depths follow (its name, or its id if it is gone from the study) and the offset below it, km; or the zone's own list. */
  readonly basis:
    | { readonly kind: 'surface'; readonly surface: string; readonly offsetKm: number }
    | { readonly kind: 'list' };
}

/** Middle value of a sorted, non-empty list; the mean of the two middle ones for an even count. */
function medianOfSorted(sorted: readonly number[]): number {
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1
    ? (sorted[mid] as number)
    : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

/**
 * The screening's per-cell zone depths (results' diagnostics) summed up per zone: the number of
 * cells, the shallowest, median and deepest depth used, and what the depths follow. A zone with
 * no cells is left out.
 */
export function zoneDepthSummaries(
  reports: readonly ZoneDepthReport[],
  sources: readonly Source[],
): ZoneDepthSummary[] {
  const names = new Map(sources.map((s) => [s.id, s.name]));
  return reports.flatMap((report) => {
    const depths = report.cells
      .flatMap((cell) => cell.depths.map((d) => d.depthKm))
      .sort((a, b) => a - b);
    if (depths.length === 0) return [];
    const basis = report.basis;
    return [
      {
        sourceId: report.sourceId,
        name: report.name,
        cells: report.cells.length,
        shallowestKm: depths[0] as number,
        medianKm: medianOfSorted(depths),
        deepestKm: depths[depths.length - 1] as number,
        basis:
          basis === 'depths'
            ? { kind: 'list' as const }
            : {
                kind: 'surface' as const,
                surface: names.get(basis.depthFromSource) ?? basis.depthFromSource,
                offsetKm: basis.offsetKm,
              },
      },
    ];
  });
}
