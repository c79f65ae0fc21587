import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import type { Study } from '../../../api/engine/model.ts';
import {
  joinRuptureTables,
  ruptureTable,
} from '../../../api/engine/hazard/rupture-table-builder.ts';
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

  it('joins the tables of consecutive parts of the sources into the whole table, however split', () => {
    const study = allKindsStudy();
    const whole = studyRuptureTable(study).table;
    const n = study.sources.length;
    expect(n).toBeGreaterThanOrEqual(3);
    const splits = [
      [0, n],
      [0, 1, n],
      [0, 2, n],
      [0, 1, 2, n],
      Array.from({ length: n + 1 }, (_, i) => i),
    ];
    for (const cuts of splits) {
      const parts = cuts
        .slice(1)
        .map((end, p) => studyRuptureTable(study, { first: cuts[p]!, end }).table);
      expect(joinRuptureTables(parts)).toEqual(whole);
      const shared = joinRuptureTables(parts, (bytes) => new SharedArrayBuffer(bytes));
      expect(shared.planeCorners.buffer).toBeInstanceOf(SharedArrayBuffer);
      expect(Array.from(shared.planeStart)).toEqual(Array.from(whole.planeStart));
      expect(Array.from(shared.planeCorners)).toEqual(Array.from(whole.planeCorners));
    }
    // A part with no sources is an empty table and changes nothing.
    const empty = studyRuptureTable(study, { first: 1, end: 1 }).table;
    expect(empty.count).toBe(0);
    expect(
      joinRuptureTables([
        studyRuptureTable(study, { first: 0, end: 1 }).table,
        empty,
        studyRuptureTable(study, { first: 1, end: n }).table,
      ]),
    ).toEqual(whole);
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
