import {
  isPluralCategory,
  placeholdersOf,
  pluralCategoriesOf,
  type PluralCategory,
  type TextEntry,
} from '../plural-forms.ts';
import type { Language, TextBundle } from '../text-bundles.ts';
import type { TextKey } from '../text-key.ts';
import { PLURAL_SEPARATOR, type FileProblem, type ReadRow } from './translation-rows.ts';

export interface CheckedImport {
  /** The translated texts, when nothing refuses the file. */
  readonly text: Partial<Record<TextKey, TextEntry>>;
  /** What refuses the file: unknown keys, placeholders that differ, repeated keys… */
  readonly problems: FileProblem[];
  /** Lines left empty: not refused, the English stands in for them. */
  readonly empty: FileProblem[];
}

const list = (names: readonly string[]): string => names.map((n) => `{${n}}`).join(', ');

/**
 * Checks the rows of a translation file against the English bundle: every key must be one of
 * English's, every translation must have exactly the placeholders of its English, a plural
 * form must be one `language` uses, and no key may come twice. Empty translations are reported
 * and left out. A file with any problem is refused whole (the caller saves nothing).
 */
export function checkImport(
  english: TextBundle,
  language: Language,
  rows: readonly ReadRow[],
): CheckedImport {
  const problems: FileProblem[] = [];
  const empty: FileProblem[] = [];
  const strings: Partial<Record<TextKey, string>> = {};
  const plurals: Partial<Record<TextKey, Partial<Record<PluralCategory, string>>>> = {};
  const seen = new Map<string, number>();
  const categories = pluralCategoriesOf(language.locale);
  for (const row of rows) {
    const [key, form, ...rest] = row.id.split(PLURAL_SEPARATOR) as [string, ...string[]];
    const at = { line: row.line, key: row.id };
    const entry = english.text[key as TextKey];
    if (entry === undefined || rest.length > 0) {
      problems.push({ ...at, message: 'unknown key: the English bundle has no such text' });
      continue;
    }
    const before = seen.get(row.id);
    if (before !== undefined) {
      problems.push({ ...at, message: `this key comes twice (first on line ${before})` });
      continue;
    }
    seen.set(row.id, row.line);
    let englishText: string;
    if (typeof entry === 'string') {
      if (form !== undefined) {
        problems.push({ ...at, message: `"${key}" has one form, not plural forms` });
        continue;
      }
      englishText = entry;
    } else {
      if (form === undefined || !isPluralCategory(form) || !categories.includes(form)) {
        problems.push({
          ...at,
          message: `"${key}" is plural: one line per form, ${categories.map((c) => `${key}|${c}`).join(', ')}`,
        });
        continue;
      }
      englishText = entry[form] ?? entry.other;
    }
    if (row.translation.trim() === '') {
      empty.push({ ...at, message: 'empty: the English stands in' });
      continue;
    }
    const expected = placeholdersOf(englishText);
    const got = placeholdersOf(row.translation);
    const missing = expected.filter((name) => !got.includes(name));
    const extra = got.filter((name) => !expected.includes(name));
    if (missing.length > 0)
      problems.push({ ...at, message: `missing placeholder ${list(missing)} (keep it as it is)` });
    if (extra.length > 0)
      problems.push({ ...at, message: `placeholder ${list(extra)} is not in the English` });
    if (missing.length > 0 || extra.length > 0) continue;
    if (form === undefined) strings[key as TextKey] = row.translation;
    else (plurals[key as TextKey] ??= {})[form as PluralCategory] = row.translation;
  }
  for (const [key, forms] of Object.entries(plurals)) {
    if (forms.other === undefined) {
      const line = seen.get(`${key}${PLURAL_SEPARATOR}${Object.keys(forms)[0]}`) ?? 0;
      problems.push({ line, key, message: `"${key}|other" is needed with the other forms` });
    }
  }
  const text = { ...strings, ...plurals } as Partial<Record<TextKey, TextEntry>>;
  return { text: problems.length === 0 ? text : {}, problems, empty };
}
