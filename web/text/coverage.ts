import { pagesOf } from './key-pages.ts';
import type { Language, TextBundles } from './text-bundles.ts';
import type { TextKey } from './text-key.ts';

export interface LanguageCoverage {
  readonly language: Language;
  /** Texts in English (a plural text counts once). */
  readonly total: number;
  readonly translated: number;
  /** Keys this language lacks, in the English bundle's order, with the pages showing them. */
  readonly missing: readonly { readonly key: TextKey; readonly pages: readonly TextKey[] }[];
}

/**
 * How much of the English each language has. A plural text counts as translated when its
 * bundle has it at all (the "other" form is required, text-bundles.ts).
 */
export function coverage(bundles: TextBundles): LanguageCoverage[] {
  const keys = Object.keys(bundles.english.text) as TextKey[];
  return bundles.languages
    .filter((language) => language.code !== bundles.english.language.code)
    .map((language) => {
      const text = bundles.get(language.code)?.text ?? {};
      const missing = keys
        .filter((key) => text[key] === undefined)
        .map((key) => ({ key, pages: pagesOf(key) }));
      return { language, total: keys.length, translated: keys.length - missing.length, missing };
    });
}
