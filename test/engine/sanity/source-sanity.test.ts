import { describe, expect, it } from 'vitest';
import type { FaultSource, Recurrence, Study, ZoneSource } from '../../../api/engine/model.ts';
import { sourceSanity } from '../../../api/engine/sanity/source-sanity.ts';
import { expectRelative } from '../../helpers/close.ts';
import { testSettings } from '../../helpers/test-settings.ts';
import { boxRing } from '../../helpers/box-ring.ts';
import { faultLonLat, zoneLonLat } from '../geometry/km-fixtures.ts';

/*
 * Invented sources in open ocean (test data). The fault: a vertical strike-slip trace along
 * 150° W from 47.135° S to 46.865° S (0.27° of latitude, 30.0 km on the WGS84 ellipsoid there,
 * from memory of the meridian arc, 111.1 km a degree), 0–15 km deep: about 450 km².
 */
const fault = (recurrence: Recurrence, setting: FaultSource['setting'] = 'crustal'): FaultSource =>
  faultLonLat(
    [
      [-150, -47.135],
      [-150, -46.865],
    ],
    { recurrence, setting, dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 15 },
  );
const zone = (recurrence: Recurrence): ZoneSource =>
  zoneLonLat([boxRing(-150.5, -47.5, -149.5, -46.5)], recurrence, 8);
const study = (...sources: Study['sources']): Study => ({
  name: 'Sanity test',
  communities: [],
  sources,
  groundMotion: { crustal: [], interface: [], intraslab: [] },
  settings: testSettings(),
});
const messages = (s: Study) => sourceSanity(s).map((w) => w.message);
const gr = (bValue: number, mMin: number, mMax: number): Recurrence => ({
  type: 'gutenberg-richter',
  bValue,
  mMin,
  mMax,
  rate: 0.001,
});
/** The first number after `prefix` in the message. */
const numberAfter = (message: string, prefix: string): number =>
  Number(message.slice(message.indexOf(prefix) + prefix.length).match(/[\d.]+/)![0]);

describe('source sanity warnings', () => {
  it('b-value outside about 0.6–1.4 (common practice), alternatives included', () => {
    expect(messages(study(fault(gr(1.0, 5, 6.5))))).toEqual([]);
    const [warning] = messages(
      study(fault({ ...gr(1.0, 5, 6.5), alternatives: { bValue: [{ value: 0.5, weight: 1 }] } })),
    );
    expect(warning).toContain('source "test-fault": b-value 0.5 lies outside the usual 0.6–1.4');
  });

  it('Mmax above what the area allows: Wells & Coppersmith (1994) Table 2A strike-slip M = 3.98 + 1.02 log10(450) = 6.69, + 2 × 0.23 = 7.15 (from memory)', () => {
    expect(messages(study(fault(gr(1, 5, 7.0))))).toEqual([]);
    const [warning] = messages(study(fault(gr(1, 5, 8.0))));
    expect(warning).toContain('source "test-fault": maximum magnitude 8 exceeds what its');
    expect(warning).toContain('Wells & Coppersmith 1994, Table 2A (strike-slip)');
    expectRelative(numberAfter(warning!, 'allows: M '), 6.69, 0.005, 'W&C 1994 at 450 km²');
  });

  it("a fault's rates implying a slip rate no active fault has: M 7 at 0.1 a year is 0.1 × 10^(1.5 × 7 + 9.05) N·m / (3e10 Pa × 450e6 m²) = 263 mm/yr (Hanks & Kanamori 1979; Brune 1968)", () => {
    expect(messages(study(fault({ type: 'fixed', magnitude: 7, rate: 0.01 })))).toEqual([]);
    const [warning] = messages(study(fault({ type: 'fixed', magnitude: 7, rate: 0.1 })));
    expect(warning).toContain('outside the 0.01–50 mm/yr of active faults');
    expectRelative(numberAfter(warning!, 'slip rate of '), 263, 0.02, 'hand computation, area ±2%');
  });

  it('an interface slipping far below plate convergence: M 7 at 1e-4 a year on 450 km² is 0.26 mm/yr (DeMets et al. 2010 for the range, from memory)', () => {
    const [warning] = messages(
      study(fault({ type: 'fixed', magnitude: 7, rate: 1e-4 }, 'interface')),
    );
    expect(warning).toContain('outside the 10–150 mm/yr of plate convergence times coupling');
    expectRelative(
      numberAfter(warning!, 'slip rate of '),
      0.263,
      0.05,
      'hand computation, rounded to 0.26',
    );
  });

  it('a zone sharing magnitudes with a fault inside it (double counting); none when the zone ends where the fault starts', () => {
    expect(messages(study(fault(gr(1, 6.5, 7)), zone(gr(1, 4.5, 6.5))))).toEqual([]);
    const [warning] = messages(study(fault(gr(1, 5, 7)), zone(gr(1, 4.5, 6.5))));
    expect(warning).toBe(
      'source "test-zone" (M 4.5–6.5) and the fault "test-fault" inside it (M 5–7) both have earthquakes of M 5–6.5: counted twice unless the zone\'s rates leave the fault\'s out (end the zone below M 5, or start the fault at M 6.5)',
    );
  });
});
