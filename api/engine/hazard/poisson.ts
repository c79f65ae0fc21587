import { InvalidInput } from '../errors.ts';

/**
 * Poisson occurrence (the usual PSHA assumption; Cornell 1968): the chance of at least one
 * exceedance in `years` when exceedances come at `annualRate` per year,
 *   P = 1 − exp(−rate × years),
 * computed as −expm1(−rate × years) so that small rates keep their digits.
 */
export function poissonProbability(annualRate: number, years: number): number {
  checkRate(annualRate);
  checkYears(years);
  return -Math.expm1(-annualRate * years);
}

/** The annual rate whose Poisson chance over `years` is `probability`: −ln(1 − P) / years. */
export function annualRateForProbability(probability: number, years: number): number {
  if (!(probability >= 0 && probability < 1)) {
    throw new InvalidInput([
      { path: 'probability', message: `expected a probability in [0, 1), got ${probability}` },
    ]);
  }
  checkYears(years);
  return -Math.log1p(-probability) / years;
}

/** Return period (years) of the level with chance `probability` of exceedance in `years`. */
export function returnPeriodForProbability(probability: number, years: number): number {
  return 1 / annualRateForProbability(probability, years);
}

function checkRate(annualRate: number): void {
  if (!(annualRate >= 0 && Number.isFinite(annualRate))) {
    throw new InvalidInput([
      { path: 'annualRate', message: `expected a finite rate >= 0 per year, got ${annualRate}` },
    ]);
  }
}

function checkYears(years: number): void {
  if (!(years > 0 && Number.isFinite(years))) {
    throw new InvalidInput([
      { path: 'years', message: `expected a finite number of years > 0, got ${years}` },
    ]);
  }
}
