import { describe, expect, it } from 'vitest';
import { ruptureWork } from '../../../api/engine/hazard/rupture-work.ts';
import { studyRuptureTable } from '../../../api/engine/hazard/study-rupture-table.ts';
import type { Recurrence, Study } from '../../../api/engine/model.ts';
import { discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import { ONE_MODEL_PER_SETTING, SETTINGS, contouredKm, pointKm } from '../geometry/km-fixtures.ts';

/*
 * The work budget (operations/work-budget.ts) counts what a screening sums at every site: each
 * rupture, each plane beyond a rupture's first (a contoured fault's mesh cells) and each
 * rupture again per variant of a source with alternatives. Counted here from the Rupture
 * objects of discretiseStudy and the study's alternatives, not from the table.
 */
const WITH_ALTERNATIVES: Recurrence = {
  type: 'gutenberg-richter',
  bValue: 1,
  mMin: 5,
  mMax: 6.5,
  rate: 0.05,
  alternatives: {
    mMax: [
      { value: 6.5, weight: 0.5 },
      { value: 7, weight: 0.5 },
    ],
    bValue: [
      { value: 0.9, weight: 0.4 },
      { value: 1.1, weight: 0.6 },
    ],
  },
};

const slab = contouredKm(
  [0, 10, 20].map((x): [number, number][] => [
    [x, 0],
    [x + 3, 40],
    [x, 80],
  ]),
  [5, 15, 25],
  { dipDeg: 45, dipDirectionDeg: 90, meshSpacingKm: 4, setting: 'interface', mechanism: 'reverse' },
);

const study: Study = {
  name: 'work',
  communities: [
    { id: 'c', name: 'c', lon: -150, lat: -47, vs30: 400, vs30Basis: 'measured', coastal: false },
  ],
  sources: [
    { ...slab, id: 'slab' },
    { ...pointKm(30, 30, WITH_ALTERNATIVES, 10), id: 'point' },
  ],
  groundMotion: ONE_MODEL_PER_SETTING,
  settings: SETTINGS,
};

describe('ruptureWork', () => {
  const { frame, table } = studyRuptureTable(study);
  const work = ruptureWork(study, table, frame);
  const { ruptures } = discretiseStudy(study);

  it('counts every plane of a contoured fault beyond each rupture first', () => {
    const extra = ruptures.reduce(
      (n, r) => n + (r.surface.kind === 'planes' ? r.surface.planes.length - 1 : 0),
      0,
    );
    expect(work.ruptures).toBe(ruptures.length);
    expect(extra).toBeGreaterThan(ruptures.length);
    expect(work.extraPlanes).toBe(extra);
  });

  it('counts the point source ruptures once per variant: 2 mMax x 2 b-values', () => {
    const ofPoint = ruptures.filter((r) => r.sourceId === 'point').length;
    expect(ofPoint).toBeGreaterThan(0);
    expect(work.variantRuptures).toBe(4 * ofPoint);
  });
});
