import { levelAtReturnPeriod, annualRateAtLevel } from '../hazard/curve-interpolation.ts';
import { poissonProbability } from '../hazard/poisson.ts';
import type { IntensityResult, ScreeningBand } from '../results.ts';
import { mmiRoman } from './mmi-roman.ts';
import { screeningBand } from './screening-band.ts';
import { mmiFromPga, pgaForMmi } from './worden2012.ts';

/**
 * Intensity is read from the PGA hazard curve: every ground-motion model predicts PGA (AGA16
 * and Cornell79 have no PGV), so one conversion serves every setting and branch alike, where
 * PGV would need a derived motion for some models.
 */
export const INTENSITY_MEASURE = 'PGA';

/** The intensities whose chance of being reached is reported. */
export const REPORTED_INTENSITIES = { VI: 6, VII: 7, VIII: 8 } as const;

/** The band is always set from the 475-year intensity (10% in 50 years), listed or not. */
export const BAND_RETURN_PERIOD_YEARS = 475;

export interface SiteIntensityOptions {
  /** The mean PGA hazard curve, g. */
  readonly levels: readonly number[];
  readonly annualRate: readonly number[];
  readonly returnPeriodsYears: readonly number[];
  readonly horizonsYears: readonly number[];
}

export interface SiteIntensity {
  readonly intensity: IntensityResult;
  readonly band: ScreeningBand;
  readonly warnings: readonly string[];
}

/**
 * MMI (Worden et al. 2012) at each return period from the PGA there; the chance of reaching
 * MMI VI, VII and VIII in each horizon from the PGA curve read log–log at each intensity's PGA
 * threshold (Poisson); and the screening band from the 475-year MMI.
 */
export function siteIntensity(options: SiteIntensityOptions): SiteIntensity {
  const { levels, annualRate } = options;
  const warnings: string[] = [];

  const atReturnPeriod: Record<string, { mmi: number | null; roman: string | null; fromMeasure: string }> = {};
  for (const years of options.returnPeriodsYears) {
    const { level } = levelAtReturnPeriod(levels, annualRate, years);
    const mmi = level === null ? null : mmiFromPga(level);
    atReturnPeriod[String(years)] = { mmi, roman: mmi === null ? null : mmiRoman(mmi), fromMeasure: INTENSITY_MEASURE };
  }

  const thresholdRates = Object.entries(REPORTED_INTENSITIES).map(([roman, mmi]) => {
    const thresholdG = pgaForMmi(mmi);
    const read = annualRateAtLevel(levels, annualRate, thresholdG);
    if (read.status !== 'ok') {
      const side = read.status === 'below-lowest-level' ? 'a lower' : 'an upper';
      warnings.push(
        `the PGA for MMI ${roman} (${thresholdG.toPrecision(3)} g) is outside the computed levels; its chance is ${side} bound`,
      );
    }
    return { roman: roman as keyof typeof REPORTED_INTENSITIES, rate: read.annualRate };
  });
  const chanceOfReaching: Record<string, Record<'VI' | 'VII' | 'VIII', number>> = {};
  for (const years of options.horizonsYears) {
    const chances = { VI: 0, VII: 0, VIII: 0 };
    for (const { roman, rate } of thresholdRates) chances[roman] = poissonProbability(rate, years);
    chanceOfReaching[String(years)] = chances;
  }

  const band475 = levelAtReturnPeriod(levels, annualRate, BAND_RETURN_PERIOD_YEARS);
  const mmi475 = band475.level === null ? null : mmiFromPga(band475.level);
  let bandMmi = mmi475;
  if (band475.status === 'above-highest-level') {
    const highest = levels[levels.length - 1];
    bandMmi = highest === undefined ? null : mmiFromPga(highest);
    warnings.push('the 475-year PGA is above the highest computed level; the band is set from the intensity at that level, a lower bound');
  }
  return { intensity: { atReturnPeriod, chanceOfReaching }, band: screeningBand(mmi475, bandMmi), warnings };
}
