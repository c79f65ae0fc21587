import { describe, expect, it } from 'vitest';
import { normalSurvival } from '../../../api/engine/hazard/normal-cdf.ts';
import { bandIntensity } from '../../../api/engine/intensity/site-intensity.ts';
import { screeningBand } from '../../../api/engine/intensity/screening-band.ts';
import { INTENSITY_CONVERSIONS } from '../../../api/engine/intensity/worden2012.ts';
import type { PointSource, Study } from '../../../api/engine/model.ts';
import { screenStudy } from '../../../api/engine/screen-study.ts';
import { expectClose } from '../../helpers/close.ts';
import { testSettings } from '../../helpers/test-settings.ts';

/*
 * An invented point source in open ocean (test data): M 6.5 only, 10 km straight below the one
 * community, with two alternatives for its annual rate, 0.001 (weight 0.3) and 0.02 (weight 0.7),
 * and Cornell et al. (1979) as the only ground-motion branch. Each variant's hazard curve is then
 * known by hand: λ(x) = rate × P(ln PGA > ln x), with the median of Cornell et al. (1979) as
 * Baker (2008) gives it, ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25), σ = 0.57 (R hypocentral,
 * km), and the normal distribution truncated at ±3σ and renormalised.
 */
const RATES = [0.001, 0.02] as const;
const WEIGHTS = [0.3, 0.7] as const;
const LEVELS = [0.01, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.8, 1, 1.5, 2];

const source: PointSource = {
  kind: 'point',
  id: 'test-point',
  name: 'Test point',
  setting: 'crustal',
  mechanism: 'strike-slip',
  rakeDeg: 0,
  recurrence: {
    type: 'fixed',
    magnitude: 6.5,
    rate: 0.02,
    alternatives: {
      rate: [
        { value: RATES[0], weight: WEIGHTS[0] },
        { value: RATES[1], weight: WEIGHTS[1] },
      ],
    },
  },
  location: [-150, -47],
  depthKm: 10,
};

const study: Study = {
  name: 'Rate alternatives',
  communities: [
    {
      id: 'above',
      name: 'above',
      lon: -150,
      lat: -47,
      vs30: 760,
      vs30Basis: 'measured',
      coastal: false,
    },
  ],
  sources: [source],
  groundMotion: { crustal: [{ model: 'Cornell79', weight: 1 }], interface: [], intraslab: [] },
  settings: testSettings({ levels: { PGA: LEVELS } }),
};

/** Baker (2008) worked form of Cornell et al. (1979), truncated at 3σ (by hand). */
const lnMedian = -0.152 + 0.859 * 6.5 - 1.803 * Math.log(10 + 25);
const truncatedExceedance = (x: number): number => {
  const eps = (Math.log(x) - lnMedian) / 0.57;
  if (eps >= 3) return 0;
  if (eps <= -3) return 1;
  return (normalSurvival(eps) - normalSurvival(3)) / (1 - 2 * normalSurvival(3));
};
const handCurve = (rate: number): number[] => LEVELS.map((x) => rate * truncatedExceedance(x));

const result = screenStudy(study).communities[0]!;
const pga = result.curves.PGA!;

describe('source-model logic tree: two rate alternatives of one point source', () => {
  it('the mean curve is 0.3 × 0.001 + 0.7 × 0.02 = 0.0143 times P(exceed) (hazard is linear in rates; Cornell 1968)', () => {
    LEVELS.forEach((x, j) =>
      expectClose(pga.annualRate[j]!, 0.0143 * truncatedExceedance(x), 1e-9, `mean at ${x} g`),
    );
  });

  it('fractiles level by level: 16th is the 0.001 curve (cumulative weight 0.3 ≥ 0.16), 50th and 84th the 0.02 curve (by hand)', () => {
    const low = handCurve(RATES[0]);
    const high = handCurve(RATES[1]);
    LEVELS.forEach((x, j) => {
      expectClose(pga.fractiles!['0.16']![j]!, low[j]!, 1e-9, `16th at ${x} g`);
      expectClose(pga.fractiles!['0.5']![j]!, high[j]!, 1e-9, `50th at ${x} g`);
      expectClose(pga.fractiles!['0.84']![j]!, high[j]!, 1e-9, `84th at ${x} g`);
    });
  });

  it('band shares: 0.3 of the weight in the band of the 0.001 curve, 0.7 in that of the 0.02 curve', () => {
    const conversion = INTENSITY_CONVERSIONS.PGA;
    const bandOf = (rate: number) =>
      screeningBand(bandIntensity(LEVELS, handCurve(rate), conversion).bandMmi).id;
    const [low, high] = [bandOf(RATES[0]), bandOf(RATES[1])];
    // With 0.001 a year in all, the 475-year rate (0.0021) is never reached: the quietest band.
    expect(low).toBe('inform');
    expect(high).toBe('refer-first');
    const shares = result.bandRobustness!.bandShares;
    expectClose(shares.inform!, 0.3, 1e-12, 'weight of the 0.001 alternative');
    expectClose(shares['refer-first']!, 0.7, 1e-12, 'weight of the 0.02 alternative');
    expect(result.bandRobustness!.combinations).toBe(2);
    expect(result.bandRobustness!.sampled).toBeNull();
  });

  it("the hinge list names the source's rate, with each alternative's 475-year MMI from its own curve", () => {
    const [hinge] = result.bandRobustness!.hinges;
    expect(hinge).toMatchObject({ choice: 'rate', sourceId: 'test-point', changesBand: true });
    const high = bandIntensity(LEVELS, handCurve(RATES[1]), INTENSITY_CONVERSIONS.PGA).bandMmi!;
    expect(hinge!.alternatives[0]!.mmi475).toBeNull();
    expectClose(hinge!.alternatives[1]!.mmi475!, high, 1e-6, '475-year MMI of the 0.02 curve');
  });
});
