import { describe, expect, test } from 'vitest';
import type { Source } from '../../../api/engine/model.ts';
import type { ZoneDepthReport } from '../../../api/engine/results.ts';
import { zoneDepthSummaries } from '../../../web/data/zone-depth-summary.ts';

/** Small hand-made reports (invented): the summary's counts and order statistics by hand. */
const cell = (...depths: [number, number][]) => ({
  lon: -140,
  lat: -47,
  depths: depths.map(([depthKm, weight]) => ({ depthKm, weight })),
});
const sources = [{ id: 'slab-top', name: 'Slab top' }] as unknown as Source[];

describe('zone depth summaries', () => {
  test('a zone following a surface: cells, shallowest, median of an odd count, deepest, the surface by name', () => {
    const report: ZoneDepthReport = {
      sourceId: 'deep',
      name: 'Deep',
      basis: { depthFromSource: 'slab-top', offsetKm: 10 },
      cells: [cell([42, 1]), cell([18.5, 1]), cell([30, 1])],
    };
    expect(zoneDepthSummaries([report], sources)).toEqual([
      {
        sourceId: 'deep',
        name: 'Deep',
        cells: 3,
        shallowestKm: 18.5,
        medianKm: 30,
        deepestKm: 42,
        basis: { kind: 'surface', surface: 'Slab top', offsetKm: 10 },
      },
    ]);
  });

  test('a list of depths counts each depth of each cell; an even count takes the mean of the middle two', () => {
    const report: ZoneDepthReport = {
      sourceId: 'list',
      name: 'List',
      basis: 'depths',
      cells: [cell([10, 0.5], [40, 0.5]), cell([10, 0.5], [40, 0.5])],
    };
    expect(zoneDepthSummaries([report], sources)[0]).toMatchObject({
      cells: 2,
      shallowestKm: 10,
      medianKm: 25,
      deepestKm: 40,
      basis: { kind: 'list' },
    });
  });

  test('a surface gone from the study is named by its id; a zone with no cells is left out', () => {
    const gone: ZoneDepthReport = {
      sourceId: 'deep',
      name: 'Deep',
      basis: { depthFromSource: 'old-slab', offsetKm: -5 },
      cells: [cell([7, 1])],
    };
    const empty: ZoneDepthReport = { ...gone, sourceId: 'empty', cells: [] };
    const summaries = zoneDepthSummaries([gone, empty], sources);
    expect(summaries.map((s) => s.sourceId)).toEqual(['deep']);
    expect(summaries[0]?.basis).toEqual({ kind: 'surface', surface: 'old-slab', offsetKm: -5 });
  });
});
