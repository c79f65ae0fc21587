import { describe, it } from 'vitest';
import { momentNm, momentRateNmYr } from '../../../api/engine/recurrence/seismic-moment.ts';
import { expectRelative } from '../../helpers/close.ts';

describe('seismic moment (Hanks & Kanamori 1979)', () => {
  it('M 7.0 -> 10^(1.5 x 7 + 9.05) = 3.548e19 N·m, from Mw = (2/3) log10 M0 - 10.7 in dyne·cm (from memory)', () => {
    expectRelative(momentNm(7), 3.5481e19, 1e-4, 'Hanks & Kanamori 1979, M0 of M 7.0 in N·m');
    expectRelative(momentNm(6), 1.122e18, 1e-4, 'Hanks & Kanamori 1979, M0 of M 6.0 in N·m');
  });
  it('a magnitude unit is a factor 10^1.5 in moment', () => {
    expectRelative(
      momentNm(7.5) / momentNm(6.5),
      10 ** 1.5,
      1e-12,
      'Hanks & Kanamori 1979, slope 1.5',
    );
  });
  it('moment rate = μ A s: 3e10 Pa x 1500 km² x 4 mm/yr = 1.8e17 N·m/yr (Brune 1968, from memory; arithmetic by hand)', () => {
    expectRelative(momentRateNmYr(3e10, 1500, 4), 1.8e17, 1e-12, 'μ A s in SI units');
  });
});
