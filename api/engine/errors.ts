/**
 * Domain failures. Each message says what was expected and what was got; the service maps
 * them to 4xx answers in one place, the CLI to exit code 2.
 */

export class TremoraError extends Error {
  override name = 'TremoraError';
}

export class UnknownModel extends TremoraError {
  override name = 'UnknownModel';
  constructor(
    readonly model: string,
    readonly known: readonly string[],
  ) {
    super(`unknown ground-motion model "${model}"; expected one of ${known.join(', ')}`);
  }
}

export class UnsupportedMeasure extends TremoraError {
  override name = 'UnsupportedMeasure';
  constructor(
    readonly measure: string,
    readonly detail: string,
  ) {
    super(`unsupported measure "${measure}": ${detail}`);
  }
}

export class UnsupportedPeriod extends TremoraError {
  override name = 'UnsupportedPeriod';
  constructor(
    readonly model: string,
    readonly periodS: number,
    readonly minS: number,
    readonly maxS: number,
  ) {
    super(
      `${model} has no spectral period ${periodS} s; expected a period from ${minS} to ${maxS} s`,
    );
  }
}

export class StudyTooLarge extends TremoraError {
  override name = 'StudyTooLarge';
  constructor(
    readonly size: number,
    readonly budget: number,
    readonly detail: string,
  ) {
    super(`study is too large: ${detail} = ${size}, over the budget of ${budget}`);
  }
}

/** One problem found in user input: a dotted path (`sources.features[3].properties.dip`) and a message. */
export interface InputIssue {
  readonly path: string;
  readonly message: string;
}

export class InvalidInput extends TremoraError {
  override name = 'InvalidInput';
  constructor(
    readonly issues: readonly InputIssue[],
    summary = 'invalid input',
  ) {
    super(`${summary}: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
  }
}

/** A screening stopped on request (ScreenStudyOptions.shouldStop) before it finished. */
export class Cancelled extends TremoraError {
  override name = 'Cancelled';
  constructor(readonly shareDone: number) {
    super(
      `screening cancelled on request after ${Math.round(shareDone * 100)}% of the work; expected to run to the end`,
    );
  }
}
