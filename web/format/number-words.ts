/**
 * Whole numbers in running text: zero to ten in words, larger ones in digits with the
 * language's grouping ("1,850"). Spelling out one to ten and using digits above is common
 * practice in plain-language writing; a number beside a unit or in a table stays in digits.
 */
export interface NumberWordsVocabulary {
  /** Words for 0 to 10, in order. */
  readonly smallNumbers: readonly string[];
  /** BCP 47 language tag for the digits' grouping. */
  readonly locale: string;
}

export const WORDS_UP_TO = 10;

/** `count` in words when it is a whole number from 0 to 10, else in grouped digits. */
export function numberInWords(count: number, vocabulary: NumberWordsVocabulary): string {
  if (!Number.isFinite(count)) throw new RangeError(`expected a finite number, got ${count}`);
  if (Number.isInteger(count) && count >= 0 && count <= WORDS_UP_TO) {
    const word = vocabulary.smallNumbers[count];
    if (word === undefined)
      throw new RangeError(
        `the vocabulary has no word for ${count}; expected ${WORDS_UP_TO + 1} words`,
      );
    return word;
  }
  return groupedDigits(count, vocabulary.locale);
}

/** A number in digits with the language's grouping, rounded to a whole number. */
export function groupedDigits(value: number, locale: string): string {
  return new Intl.NumberFormat(locale, { maximumFractionDigits: 0 }).format(value);
}
