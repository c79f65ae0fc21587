import { pluralCategoriesOf, type PluralCategory } from '../plural-forms.ts';
import type { TextBundle } from '../text-bundles.ts';
import type { TextKey } from '../text-key.ts';

/**
 * One line of a translation file, as both formats carry it (po-file.ts, csv-file.ts): the id
 * is the text key, or "key|category" for one plural form (a line per CLDR plural category the
 * language uses, so a translator never writes a plural formula), the English beside it.
 */
export interface TranslationRow {
  readonly id: string;
  readonly english: string;
  readonly translation: string;
}

/** A row read back from a file, with the line it starts on. */
export interface ReadRow {
  readonly id: string;
  readonly translation: string;
  readonly line: number;
}

/** A problem with a file, by line and, where known, key. */
export interface FileProblem {
  readonly line: number;
  readonly key?: string;
  readonly message: string;
}

export const PLURAL_SEPARATOR = '|';

/** Every English text with `target`'s translation, or "" where it has none: the export. */
export function translationRows(english: TextBundle, target: TextBundle): TranslationRow[] {
  const categories = pluralCategoriesOf(target.language.locale);
  const rows: TranslationRow[] = [];
  for (const [key, entry] of Object.entries(english.text)) {
    const theirs = target.text[key as TextKey];
    if (entry === undefined) continue;
    if (typeof entry === 'string') {
      rows.push({ id: key, english: entry, translation: typeof theirs === 'string' ? theirs : '' });
      continue;
    }
    for (const category of categories) {
      const form = (forms: typeof entry | undefined, c: PluralCategory) => forms?.[c];
      rows.push({
        id: `${key}${PLURAL_SEPARATOR}${category}`,
        english: form(entry, category) ?? entry.other,
        translation: typeof theirs === 'object' ? (form(theirs, category) ?? '') : '',
      });
    }
  }
  return rows;
}
