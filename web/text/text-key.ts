import type english from './bundles/en.json';

/**
 * The English bundle's text, as TypeScript reads web/text/bundles/en.json: its keys are the
 * type of a text key, so a misspelt key fails `tsc`. Nothing here is loaded at run time (the
 * bundles are read by text-bundles.ts).
 */
type EnglishText = (typeof english)['text'];

export type TextKey = keyof EnglishText;

/** Keys whose English entry has one form per plural category ({ "one": …, "other": … }). */
export type PluralKey = {
  [K in TextKey]: EnglishText[K] extends string ? never : K;
}[TextKey];
