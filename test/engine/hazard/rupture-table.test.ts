import { describe, expect, it } from 'vitest';
import { ruptureTable } from '../../../api/engine/hazard/rupture-table-builder.ts';
import {
  PLANE_STRIDE,
  distinctContexts,
  settingRuptures,
} from '../../../api/engine/hazard/rupture-table.ts';
import { discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';

// The table is a layout of discretiseStudy's ruptures: it must hold every number of them, unchanged.
const { ruptures } = discretiseStudy(allKindsStudy());
const table = ruptureTable(ruptures);

describe('ruptureTable', () => {
  it("holds each rupture's rate, context, source and hypocentre, in order", () => {
    expect(table.count).toBe(ruptures.length);
    const { contexts, contextOf } = distinctContexts(
      table,
      Int32Array.from(ruptures, (_, i) => i),
    );
    ruptures.forEach((r, i) => {
      expect(table.annualRate[i]).toBe(r.annualRate);
      expect(contexts[contextOf[i]!]).toEqual(r.context);
      expect(table.sourceIds[table.sourceIndex[i]!]).toBe(r.sourceId);
      expect([
        table.hypocentre[3 * i],
        table.hypocentre[3 * i + 1],
        table.hypocentre[3 * i + 2],
      ]).toEqual([r.surface.hypocentre.x, r.surface.hypocentre.y, r.surface.hypocentre.z]);
      expect(table.isPoint[i]).toBe(r.surface.kind === 'point' ? 1 : 0);
    });
  });

  it('lists each rupture context once, so that ruptures which share one share its model work', () => {
    const { contexts, contextOf } = distinctContexts(
      table,
      Int32Array.from(ruptures, (_, i) => i),
    );
    const keys = contexts.map((c) => JSON.stringify(c));
    expect(new Set(keys).size).toBe(contexts.length);
    // The fixture's zone puts many cells at each magnitude: far fewer contexts than ruptures.
    expect(contexts.length).toBeLessThan(ruptures.length / 2);
    expect(Math.max(...contextOf)).toBe(contexts.length - 1);
  });

  it("holds every plane's corners, each rupture's planes in a row", () => {
    ruptures.forEach((r, i) => {
      const planes = r.surface.kind === 'planes' ? r.surface.planes : [];
      expect(table.planeStart[i + 1]! - table.planeStart[i]!).toBe(planes.length);
      planes.forEach((plane, p) => {
        const at = (table.planeStart[i]! + p) * PLANE_STRIDE;
        expect(Array.from(table.planeCorners.subarray(at, at + PLANE_STRIDE))).toEqual(
          plane.corners.flatMap((c) => [c.x, c.y, c.z]),
        );
      });
    });
  });

  it("lists each setting's ruptures in table order", () => {
    for (const setting of ['crustal', 'interface', 'intraslab'] as const) {
      expect(Array.from(settingRuptures(table, setting))).toEqual(
        ruptures.flatMap((r, i) => (r.context.setting === setting ? [i] : [])),
      );
    }
  });
});
