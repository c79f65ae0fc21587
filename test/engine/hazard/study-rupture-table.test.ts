import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import type { Study } from '../../../api/engine/model.ts';
import { ruptureTable } from '../../../api/engine/hazard/rupture-table-builder.ts';
import { studyRuptureTable } from '../../../api/engine/hazard/study-rupture-table.ts';
import { discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';

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
      expect(direct.table).toEqual(ruptureTable(ruptures));
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
