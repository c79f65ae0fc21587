import { describe, expect, it } from 'vitest';
import { zoneCells } from '../../../api/engine/geometry/zone-cells.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import type { Study } from '../../../api/engine/model.ts';
import { screenStudy } from '../../../api/engine/screen-study.ts';
import { expectClose } from '../../helpers/close.ts';
import {
  FRAME,
  ONE_MODEL_PER_SETTING,
  SETTINGS,
  contouredKm,
  zoneKm,
} from '../geometry/km-fixtures.ts';

/*
 * A plane dipping 45° east from 5 km depth at x = 0 (contours every 10 km of depth, 10 km
 * apart): under a point x km east of the top contour it lies 5 + x km deep (tan 45° = 1). The
 * zone's cells take their depths 10 km below it, so a cell centred at x lies 15 + x km deep.
 */
const slab = {
  ...contouredKm(
    [5, 15, 25].map((d): [number, number][] => [
      [d - 5, -10],
      [d - 5, 70],
    ]),
    [5, 15, 25],
    { dipDeg: 45, dipDirectionDeg: 90, setting: 'interface', mechanism: 'reverse' },
  ),
  id: 'slab-top',
};
const square: [number, number][] = [
  [2, 0],
  [18, 0],
  [18, 60],
  [2, 60],
  [2, 0],
];
const RECURRENCE = {
  type: 'gutenberg-richter',
  bValue: 1,
  mMin: 5,
  mMax: 5.5,
  rate: 0.01,
} as const;
const following = {
  ...zoneKm([square], RECURRENCE),
  id: 'in-slab',
  setting: 'intraslab' as const,
  depthFrom: { sourceId: 'slab-top', offsetKm: 10 },
};
const listed = {
  ...zoneKm([square], RECURRENCE),
  id: 'listed',
  depths: [
    { depthKm: 40, weight: 0.4 },
    { depthKm: 70, weight: 0.6 },
  ],
};
const [lon, lat] = FRAME.toLonLat({ x: 60, y: 30 });
const study: Study = {
  name: 'depths',
  communities: [{ id: 'c', name: 'c', lon, lat, vs30: 400, vs30Basis: 'measured', coastal: false }],
  sources: [slab, following, listed, { ...zoneKm([square], RECURRENCE), id: 'one-depth' }],
  groundMotion: ONE_MODEL_PER_SETTING,
  settings: SETTINGS,
};

describe('the depths used per zone cell, in the results diagnostics', () => {
  const { diagnostics } = screenStudy(study);
  const frame = frameForStudy(study);

  it('lists the zones whose depths follow a surface or a list, not a zone of one depth', () => {
    expect(diagnostics.zoneDepths.map((z) => z.sourceId)).toEqual(['in-slab', 'listed']);
    expect(diagnostics.zoneDepths[0]?.basis).toEqual({ depthFromSource: 'slab-top', offsetKm: 10 });
    expect(diagnostics.zoneDepths[1]?.basis).toBe('depths');
  });

  it('gives every cell of the following zone 10 km below the plane under it: 15 + x km (hand calculation)', () => {
    const report = diagnostics.zoneDepths[0]!;
    const cells = zoneCells(following, frame, SETTINGS.zoneCellKm);
    expect(report.cells.length).toBe(cells.length);
    for (const cell of report.cells) {
      // x east of the top contour, in the frame the plane was drawn in.
      const { x } = FRAME.toLocal([cell.lon, cell.lat]);
      expect(cell.depths.length).toBe(1);
      // Positions are rounded to 1e-4° (about 8 m east-west here), depths to 0.01 km, and the
      // study's frame (centred on its sources) differs from the drawing frame by metres here.
      expectClose(cell.depths[0]!.depthKm, 15 + x, 0.05, 'depth of a 45° plane plus the offset');
    }
  });

  it('gives every cell of the listed zone its depths and weights', () => {
    for (const cell of diagnostics.zoneDepths[1]!.cells)
      expect(cell.depths).toEqual([
        { depthKm: 40, weight: 0.4 },
        { depthKm: 70, weight: 0.6 },
      ]);
  });
});
