export { magnitudeBins, magnitudeEdges, type MagnitudeBins } from './magnitude-bins.ts';
export { betaOf, exponentialMass, rateAboveMinimum, truncatedExponentialBinProbabilities } from './truncated-gr.ts';
export { CHARACTERISTIC_BOX_WIDTH, CHARACTERISTIC_HEIGHT_OFFSET, characteristicBinProbabilities } from './characteristic.ts';
export { momentBalancedRates } from './moment-balanced.ts';
export { momentNm, momentRateNmYr } from './seismic-moment.ts';
