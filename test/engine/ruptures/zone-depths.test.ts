import { describe, expect, it } from 'vitest';
import type { Settings, ZoneSource } from '../../../api/engine/model.ts';
import { discretiseSource } from '../../../api/engine/ruptures/discretise.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { testSettings } from '../../helpers/test-settings.ts';
import { FRAME, contouredKm, zoneKm } from '../geometry/km-fixtures.ts';

/**
 * Zone earthquakes that follow a contoured surface, or take weighted depths. The surface is a
 * plane dipping 30° east given as contours at 10 km (x = 0) and 40 km (x = 30 / tan 30°), so
 * straight under x it lies 10 + x·tan 30° km deep (plain trigonometry); east of its deep edge
 * the edge's 40 km is carried out flat (ruptures/zone-depths.ts). Invented test scaffolding.
 */
const SETTINGS: Settings = testSettings({ magnitudeStep: 0.5 });
const TAN_30 = Math.tan(Math.PI / 6);
const X_BOTTOM = 30 / TAN_30;
const slab = contouredKm(
  [
    [
      [0, -20],
      [0, 120],
    ],
    [
      [X_BOTTOM, -20],
      [X_BOTTOM, 120],
    ],
  ],
  [10, 40],
  { dipDeg: 30, dipDirectionDeg: 90, id: 'slab-top', setting: 'interface', mechanism: 'reverse' },
);
const RECURRENCE = { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7, rate: 0.1 } as const;
const ring: [number, number][] = [
  [10, 0],
  [90, 0],
  [90, 100],
  [10, 100],
  [10, 0],
];

describe('a zone whose depths follow a contoured surface', () => {
  const zone: ZoneSource = {
    ...zoneKm([ring], RECURRENCE, 50),
    setting: 'intraslab',
    depthFrom: { sourceId: 'slab-top', offsetKm: 5 },
  };

  it('puts each cell’s hypocentres 5 km below the surface straight under its centre, to 0.1 km', () => {
    const ruptures = discretiseSource(zone, 1, FRAME, SETTINGS, [], [slab, zone]);
    expect(ruptures.length).toBeGreaterThan(0);
    let beyond = 0;
    for (const r of ruptures) {
      const { x, z } = r.surface.hypocentre;
      const expected = 10 + Math.min(x, X_BOTTOM) * TAN_30 + 5;
      if (x > X_BOTTOM) beyond++;
      // To the nearest 0.1 km (FOLLOWED_DEPTH_STEP_KM).
      expectClose(
        z,
        Math.round(expected * 10) / 10,
        1e-9,
        `depth under x = ${x} km: 10 + x tan 30° + 5`,
      );
      expectClose(r.context.hypoDepthKm, z, 1e-12, 'the context’s hypocentral depth');
    }
    expect(beyond).toBeGreaterThan(0);
  });

  it('is refused when the named source is not a contoured fault', () => {
    const lost = { ...zone, depthFrom: { sourceId: 'nowhere', offsetKm: 5 } };
    expect(() => discretiseSource(lost, 1, FRAME, SETTINGS, [], [slab, lost])).toThrow(
      /sources\.features\[1\]\.properties\.depthFromSource\.id: expected the id of a fault given by depth contours/,
    );
  });
});

describe('a zone with weighted depths', () => {
  it('places every cell at each depth with its weight, keeping the zone’s rate', () => {
    const single = zoneKm([ring], RECURRENCE, 30);
    const weighted: ZoneSource = {
      ...single,
      depths: [
        { depthKm: 20, weight: 0.25 },
        { depthKm: 60, weight: 0.75 },
      ],
    };
    const a = discretiseSource(single, 0, FRAME, SETTINGS);
    const b = discretiseSource(weighted, 0, FRAME, SETTINGS);
    expect(b.length).toBe(2 * a.length);
    const total = (rs: typeof a) => rs.reduce((sum, r) => sum + r.annualRate, 0);
    expectRelative(total(b), total(a), 1e-12, 'the zone’s total rate, weights summing to 1');
    const deep = b.filter((r) => r.surface.hypocentre.z === 60);
    expectRelative(total(deep), 0.75 * total(a), 1e-12, 'the 60 km share, weight 0.75');
  });
});
