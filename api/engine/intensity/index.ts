export { mmiFromPga, mmiFromPgv, pgaForMmi, pgvForMmi, mmiFromMotion, motionFromMmi, MMI_MAX, MMI_MIN, WORDEN2012_PGA, WORDEN2012_PGV, type Gmice } from './worden2012.ts';
export { mmiRoman } from './mmi-roman.ts';
export { SCREENING_BANDS, screeningBand, type ScreeningBandId } from './screening-band.ts';
export { BAND_RETURN_PERIOD_YEARS, INTENSITY_MEASURE, REPORTED_INTENSITIES, siteIntensity, type SiteIntensity, type SiteIntensityOptions } from './site-intensity.ts';
