import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  mmiFromPga,
  mmiFromPgv,
  pgaForMmi,
  pgvForMmi,
  WORDEN2012_PGA,
  WORDEN2012_PGV,
} from '../../../api/engine/intensity/worden2012.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

/*
 * Worden et al. (2012), BSSA 102(1), Table 1, equation (3) without the residual terms
 * (coefficients from memory): PGA (cm/s²) c1 1.78, c2 1.55, c3 −1.60, c4 3.70, t1 1.57, t2 4.22;
 * PGV (cm/s) c1 3.78, c2 1.47, c3 2.89, c4 3.16, t1 0.53, t2 4.56. Expected values are
 * hand computations from those coefficients, with g = 980.665 cm/s².
 */
describe('Worden et al. (2012) GMICE', () => {
  it('holds the quoted coefficients (Table 1, from memory)', () => {
    expect(WORDEN2012_PGA).toEqual({
      c1: 1.78,
      c2: 1.55,
      c3: -1.6,
      c4: 3.7,
      t1: 1.57,
      t2: 4.22,
      sigmaMmi: 0.73,
    });
    expect(WORDEN2012_PGV).toEqual({
      c1: 3.78,
      c2: 1.47,
      c3: 2.89,
      c4: 3.16,
      t1: 0.53,
      t2: 4.56,
      sigmaMmi: 0.65,
    });
  });

  const pgaCases = [
    {
      title:
        'PGA 0.1 g = 98.0665 cm/s²: log10 = 1.991522 > t1, MMI = −1.60 + 3.70 × 1.991522 = 5.768626',
      pgaG: 0.1,
      mmi: 5.768626499635895,
      source: 'Worden 2012 eq. 3 upper segment, hand computation',
    },
    {
      title: 'PGA 0.3 g: MMI = 7.533975 (upper segment)',
      pgaG: 0.3,
      mmi: 7.533975142098647,
      source: 'Worden 2012 eq. 3, hand computation',
    },
    {
      title:
        'PGA 0.02 g = 19.6133 cm/s²: log10 = 1.292551 <= t1, MMI = 1.78 + 1.55 × 1.292551 = 3.783454 (lower segment)',
      pgaG: 0.02,
      mmi: 3.7834535404239373,
      source: 'Worden 2012 eq. 3 lower segment, hand computation',
    },
  ];
  for (const { title, pgaG, mmi, source } of pgaCases)
    it(title, () => {
      expectClose(mmiFromPga(pgaG), mmi, 1e-9, source);
    });
  it('PGV 1 cm/s: MMI = c1 = 3.78; PGV 10 cm/s: 2.89 + 3.16 = 6.05; PGV 50 cm/s: 8.258745', () => {
    expectClose(mmiFromPgv(1), 3.78, 1e-12, 'Worden 2012, log10(1) = 0');
    expectClose(mmiFromPgv(10), 6.05, 1e-12, 'Worden 2012, hand computation');
    expectClose(mmiFromPgv(50), 8.25874521370182, 1e-9, 'Worden 2012, hand computation');
  });

  it('the break: log10 Y = t1 uses the lower segment; the two segments meet there within 0.005 MMI', () => {
    const atBreakG = 10 ** 1.57 / 980.665;
    expectClose(mmiFromPga(atBreakG), 1.78 + 1.55 * 1.57, 1e-12, 'lower segment at t1');
    expectClose(
      mmiFromPga(atBreakG * (1 + 1e-9)),
      -1.6 + 3.7 * 1.57,
      1e-8,
      'upper segment just past t1',
    );
    expectClose(
      mmiFromPga(atBreakG),
      mmiFromPga(atBreakG * (1 + 1e-9)),
      0.005,
      'segments meet (coefficients consistent)',
    );
    expectClose(
      mmiFromPgv(10 ** 0.53),
      mmiFromPgv(10 ** 0.53 * (1 + 1e-9)),
      0.006,
      'PGV segments meet',
    );
  });

  it('inverse thresholds: MMI VI at 0.115487 g, VII 0.215181 g, VIII 0.400935 g; MMI IV at 0.027589 g (below t2)', () => {
    // MMI 6 > t2: log10 PGA = (6 + 1.60) / 3.70 = 2.054054 → 113.254 cm/s² → 0.115487 g
    expectRelative(
      pgaForMmi(6),
      0.11548707409286672,
      1e-9,
      'Worden 2012 inverse, hand computation',
    );
    expectRelative(
      pgaForMmi(7),
      0.21518086487930072,
      1e-9,
      'Worden 2012 inverse, hand computation',
    );
    expectRelative(pgaForMmi(8), 0.4009349528846004, 1e-9, 'Worden 2012 inverse, hand computation');
    // MMI 4 <= t2: log10 PGA = (4 − 1.78) / 1.55 = 1.432258
    expectRelative(
      pgaForMmi(4),
      0.027589090826827974,
      1e-9,
      'Worden 2012 inverse lower segment, hand computation',
    );
    expectRelative(
      pgvForMmi(6),
      9.642223972542295,
      1e-9,
      'Worden 2012 PGV inverse, hand computation',
    );
    expectRelative(
      pgvForMmi(4),
      1.4114316893287422,
      1e-9,
      'Worden 2012 PGV inverse lower segment, hand computation',
    );
  });

  // Away from both breaks: MMI 4.22 for PGA and 4.56 for PGV (Table 1), where the two segments
  // differ by up to 0.01 MMI and the round trip is only that close.
  it('round trips exactly away from the breaks (property)', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.double({ min: 1.2, max: 4.1, noNaN: true }),
          fc.double({ min: 4.7, max: 9.9, noNaN: true }),
        ),
        (mmi) => {
          expectClose(mmiFromPga(pgaForMmi(mmi)), mmi, 1e-9, 'PGA round trip');
          expectClose(mmiFromPgv(pgvForMmi(mmi)), mmi, 1e-9, 'PGV round trip');
        },
      ),
    );
  });

  it('round trips within 0.01 MMI across the break, where the two segments differ slightly', () => {
    for (const mmi of [4.15, 4.2, 4.22, 4.25, 4.3, 4.5, 4.56, 4.6]) {
      expectClose(mmiFromPga(pgaForMmi(mmi)), mmi, 0.01, 'segments differ by < 0.01 at the break');
      expectClose(mmiFromPgv(pgvForMmi(mmi)), mmi, 0.01, 'segments differ by < 0.01 at the break');
    }
  });

  it('holds MMI to 1–10 (common practice) and is non-decreasing in PGA', () => {
    expect(mmiFromPga(1e-6)).toBe(1);
    expect(mmiFromPga(10)).toBe(10);
    fc.assert(
      fc.property(
        fc.double({ min: 1e-5, max: 5, noNaN: true }),
        fc.double({ min: 1, max: 2, noNaN: true }),
        (pga, f) => {
          expect(mmiFromPga(pga * f)).toBeGreaterThanOrEqual(mmiFromPga(pga) - 0.005);
        },
      ),
    );
  });
});
