import { describe, expect, it } from 'vitest';
import {
  fitDimensions,
  scaledDimensions,
  STRASSER_2010_INTERFACE,
  STRASSER_2010_INTRASLAB,
  WELLS_COPPERSMITH_1994,
  type ScalingRelation,
} from '../../../api/engine/geometry/rupture-scaling.ts';
import { momentNm } from '../../../api/engine/recurrence/seismic-moment.ts';
import { expectRelative } from '../../helpers/close.ts';

/*
 * The coefficients were typed from memory, so they are checked two ways that a wrong digit
 * would fail: (1) each relation's own length x width against its area, which are separate
 * regressions in the papers and agree to about 25% over their data range; (2) the stress drop
 * the area implies for a circular crack, Δσ = (7/16) M0 / r³ with r = sqrt(A / π)
 * (Eshelby 1957; Kanamori & Anderson 1975, from memory), which for such relations lies within
 * about 1–10 MPa (common practice), checked against a wider 0.5–20 MPa.
 */
const relations: readonly [ScalingRelation, readonly number[]][] = [
  [WELLS_COPPERSMITH_1994['strike-slip'], [6, 6.5, 7, 7.5, 8]],
  [WELLS_COPPERSMITH_1994.reverse, [6, 6.5, 7, 7.5]],
  [WELLS_COPPERSMITH_1994.normal, [6, 6.5, 7, 7.3]],
  [STRASSER_2010_INTERFACE, [7, 8, 9]],
  [STRASSER_2010_INTRASLAB, [6, 6.5, 7, 7.5]],
];

describe('rupture scaling tables', () => {
  for (const [relation, magnitudes] of relations) {
    it(`${relation.name}: length x width agrees with area, and stress drop is plausible`, () => {
      for (const m of magnitudes) {
        const length = 10 ** (relation.length[0] + relation.length[1] * m);
        const { areaKm2, widthKm } = scaledDimensions(relation, m);
        expectRelative(length * widthKm, areaKm2, 0.25, `${relation.name} L x W vs A at M ${m}`);
        const r = Math.sqrt((areaKm2 * 1e6) / Math.PI);
        const stressDropMPa = ((7 / 16) * momentNm(m)) / r ** 3 / 1e6;
        expect(stressDropMPa, `${relation.name} stress drop at M ${m}`).toBeGreaterThan(0.5);
        expect(stressDropMPa, `${relation.name} stress drop at M ${m}`).toBeLessThan(20);
      }
    });
  }
});

describe('rupture dimensions at M 7.0, strike-slip (Wells & Coppersmith 1994 Table 2A, from memory)', () => {
  // log10 RA = -3.42 + 0.90 M; log10 RW = -0.76 + 0.27 M. At M 7: RA = 10^2.88, RW = 10^1.13.
  const area = 758.5776;
  const width = 13.48963;
  const scaled = scaledDimensions(WELLS_COPPERSMITH_1994['strike-slip'], 7);

  it('median area and width, length = area / width', () => {
    expectRelative(scaled.areaKm2, area, 1e-6, 'RA = 10^2.88 km²');
    expectRelative(scaled.widthKm, width, 1e-6, 'RW = 10^1.13 km');
    expectRelative(scaled.lengthKm, area / width, 1e-6, 'L = RA / RW = 56.23 km');
  });

  it('on a wide, long fault nothing is capped', () => {
    const fit = fitDimensions(scaled, 200, 20);
    expectRelative(fit.widthKm, width, 1e-6, 'uncapped width');
    expectRelative(fit.lengthKm, 56.2341, 1e-5, 'uncapped length');
  });

  it('width capped at the fault width, length grown to keep the area', () => {
    const fit = fitDimensions(scaled, 200, 10);
    expectRelative(fit.widthKm, 10, 1e-12, 'width = fault width');
    expectRelative(fit.lengthKm, area / 10, 1e-6, 'length = RA / 10 km = 75.86 km');
    expectRelative(fit.areaKm2, area, 1e-6, 'area kept');
  });

  it('length capped at the fault length', () => {
    const fit = fitDimensions(scaled, 50, 10);
    expectRelative(fit.lengthKm, 50, 1e-12, 'length = fault length');
    expectRelative(fit.areaKm2, 500, 1e-12, 'area = 50 x 10 km');
  });
});
