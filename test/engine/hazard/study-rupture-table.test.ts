import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import type { Study } from '../../../api/engine/model.ts';
import { ruptureTable } from '../../../api/engine/hazard/rupture-table-builder.ts';
import type { RuptureTable } from '../../../api/engine/hazard/rupture-table.ts';
import { studyRuptureTable } from '../../../api/engine/hazard/study-rupture-table.ts';
import { discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';

/**
 * Every column of two tables equal, typed arrays compared byte for byte (stricter than
 * toEqual, and fast enough for the hundreds of thousands of virtual-rupture plane corners).
 */
function expectSameTable(actual: RuptureTable, expected: RuptureTable): void {
  expect(Object.keys(actual).sort()).toEqual(Object.keys(expected).sort());
  for (const key of Object.keys(expected) as (keyof RuptureTable)[]) {
    const a = actual[key];
    const e = expected[key];
    if (ArrayBuffer.isView(e) && ArrayBuffer.isView(a)) {
      expect(a.constructor, key).toBe(e.constructor);
      const bytes = (v: ArrayBufferView): Buffer =>
        Buffer.from(v.buffer, v.byteOffset, v.byteLength);
      expect(Buffer.compare(bytes(a), bytes(e)), key).toBe(0);
    } else expect(a, key).toEqual(e);
  }
}

// The table built straight from the sources must be the layout of discretiseStudy's ruptures,
// number for number (rupture-table.test.ts checks that layout against the Rupture objects).
describe('studyRuptureTable', () => {
  it('is ruptureTable(discretiseStudy(study).ruptures), every column equal, for every kind of source', () => {
    for (const study of [
      allKindsStudy(),
      allKindsStudy({ magnitudeStep: 0.25, ruptureSpacingKm: 7, zoneCellKm: 15 }),
    ]) {
      const direct = studyRuptureTable(study);
      const { ruptures } = discretiseStudy(study);
      expectSameTable(direct.table, ruptureTable(ruptures));
      expect(direct.table.count).toBe(ruptures.length);
      expect(direct.frame.origin).toEqual(frameForStudy(study).origin);
    }
  });

  it('names a bad field by its path in the study, as discretiseStudy does', () => {
    const base = allKindsStudy();
    const bad: Study = {
      ...base,
      sources: base.sources.map((s, i) =>
        i === 1 && s.kind === 'fault' ? { ...s, dipDeg: 0 } : s,
      ),
    };
    expect(() => studyRuptureTable(bad)).toThrow(InvalidInput);
    try {
      studyRuptureTable(bad);
    } catch (error) {
      expect((error as InvalidInput).issues[0]?.path).toBe('sources.features[1].properties.dip');
    }
  });
});
