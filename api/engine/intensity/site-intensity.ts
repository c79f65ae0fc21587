import { levelAtReturnPeriod } from '../hazard/curve-interpolation.ts';
import { poissonProbability } from '../hazard/poisson.ts';
import type { IntensityResult, ScreeningBand } from '../results.ts';
import { mmiRoman } from './mmi-roman.ts';
import { screeningBand } from './screening-band.ts';
import { annualRateOfReachingMmi } from './intensity-scatter.ts';
import { INTENSITY_CONVERSIONS, mmiFromMotion, type IntensityConversion } from './worden2012.ts';

/**
 * Intensity is read from the PGA hazard curve by default: every ground-motion model predicts
 * PGA (AGA16 and Cornell79 have no PGV), so one conversion serves every setting and branch
 * alike, where PGV needs a motion derived from SA for some models. A study may ask for the PGV
 * relation instead (settings.intensityMeasure); the result records which one it used.
 */
export const INTENSITY_MEASURE = 'PGA';

/** The measure a study's intensity is read from. */
export const intensityMeasureOf = (settings: {
  readonly intensityMeasure?: 'PGA' | 'PGV';
}): 'PGA' | 'PGV' => settings.intensityMeasure ?? INTENSITY_MEASURE;

/** The intensities whose chance of being reached is reported. */
export const REPORTED_INTENSITIES = { VI: 6, VII: 7, VIII: 8 } as const;

/** The band is always set from the 475-year intensity (10% in 50 years), listed or not. */
export const BAND_RETURN_PERIOD_YEARS = 475;

/**
 * A whole level is reached when MMI rounds to it or more: MMI ≥ level − ½, as mmiRoman names
 * levels by the rounded value (6.97 is VII).
 */
export const ROUNDING_HALF_MMI = 0.5;

/**
 * The 475-year MMI of a hazard curve (null below its lowest level) and the MMI its band is
 * chosen by: the intensity at the highest level when the 475-year level is above the curve
 * (a lower bound).
 */
export function bandIntensity(
  levels: readonly number[],
  annualRate: readonly number[],
  conversion: IntensityConversion,
): { mmi475: number | null; bandMmi: number | null; aboveCurve: boolean } {
  const toMmi = (y: number): number =>
    mmiFromMotion(y * conversion.toRelationUnits, conversion.gmice);
  const at = levelAtReturnPeriod(levels, annualRate, BAND_RETURN_PERIOD_YEARS);
  const mmi475 = at.level === null ? null : toMmi(at.level);
  if (at.status !== 'above-highest-level') return { mmi475, bandMmi: mmi475, aboveCurve: false };
  const highest = levels[levels.length - 1];
  return { mmi475, bandMmi: highest === undefined ? null : toMmi(highest), aboveCurve: true };
}

export interface SiteIntensityOptions {
  /** The mean hazard curve of the conversion's measure, g (PGA) or cm/s (PGV). */
  readonly levels: readonly number[];
  readonly annualRate: readonly number[];
  readonly returnPeriodsYears: readonly number[];
  readonly horizonsYears: readonly number[];
  /** Worden et al. (2012) from PGA (the default) or from PGV. */
  readonly conversion?: IntensityConversion;
}

export interface SiteIntensity {
  readonly intensity: IntensityResult;
  readonly band: ScreeningBand;
  readonly warnings: readonly string[];
}

/**
 * MMI (Worden et al. 2012) at each return period from the median conversion of the motion
 * there; the chance of reaching MMI VI, VII and VIII in each horizon from the hazard curve
 * convolved with the conversion's scatter (intensity-scatter.ts, Poisson); and the screening
 * band from the 475-year MMI.
 */
export function siteIntensity(options: SiteIntensityOptions): SiteIntensity {
  const { levels, annualRate } = options;
  const conversion = options.conversion ?? INTENSITY_CONVERSIONS.PGA;
  const { measure, gmice, toRelationUnits } = conversion;
  const toMmi = (y: number): number => mmiFromMotion(y * toRelationUnits, gmice);
  const unit = measure === 'PGA' ? 'g' : 'cm/s';
  const warnings: string[] = [];
  const atReturnPeriod: Record<
    string,
    { mmi: number | null; roman: string | null; fromMeasure: string }
  > = {};
  for (const years of options.returnPeriodsYears) {
    const { level } = levelAtReturnPeriod(levels, annualRate, years);
    const mmi = level === null ? null : toMmi(level);
    atReturnPeriod[String(years)] = {
      mmi,
      roman: mmi === null ? null : mmiRoman(mmi),
      fromMeasure: measure,
    };
  }
  const lowest = levels[0];
  const thresholdRates = Object.entries(REPORTED_INTENSITIES).map(([roman, level]) => {
    const threshold = level - ROUNDING_HALF_MMI;
    // Below the lowest level the curve says nothing; motions there could still reach the level with the scatter.
    if (lowest !== undefined && toMmi(lowest) + 2 * gmice.sigmaMmi > threshold) {
      warnings.push(
        `the lowest ${measure} level (${lowest} ${unit}) could reach MMI ${roman} with the conversion's scatter; its chance is a lower bound`,
      );
    }
    return {
      roman: roman as keyof typeof REPORTED_INTENSITIES,
      rate: annualRateOfReachingMmi(levels, annualRate, threshold, conversion),
    };
  });
  const chanceOfReaching: Record<string, Record<'VI' | 'VII' | 'VIII', number>> = {};
  for (const years of options.horizonsYears) {
    const chances = { VI: 0, VII: 0, VIII: 0 };
    for (const { roman, rate } of thresholdRates) chances[roman] = poissonProbability(rate, years);
    chanceOfReaching[String(years)] = chances;
  }
  const { mmi475, bandMmi, aboveCurve } = bandIntensity(levels, annualRate, conversion);
  if (aboveCurve)
    warnings.push(
      `the 475-year ${measure} is above the highest computed level; the band is set from the intensity at that level, a lower bound`,
    );
  return {
    intensity: {
      atReturnPeriod,
      chanceOfReaching,
      conversion: { measure, relation: 'Worden et al. (2012)', sigmaMmi: gmice.sigmaMmi },
    },
    band: screeningBand(mmi475, bandMmi),
    warnings,
  };
}
