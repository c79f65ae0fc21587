/**
 * Plural categories as CLDR names them (Unicode TR35, Part 3, "Language Plural Rules"), the
 * names Intl.PluralRules.select returns. A plural entry in a bundle gives one text per category
 * its language uses; "other" is always required, being the one every language has.
 */
export const PLURAL_CATEGORIES = ['zero', 'one', 'two', 'few', 'many', 'other'] as const;
export type PluralCategory = (typeof PLURAL_CATEGORIES)[number];

export type PluralForms = Readonly<Partial<Record<PluralCategory, string>>> & {
  readonly other: string;
};

/** A bundle entry: one text, or one text per plural category. */
export type TextEntry = string | PluralForms;

export const isPluralCategory = (name: string): name is PluralCategory =>
  (PLURAL_CATEGORIES as readonly string[]).includes(name);

/** The categories a language's cardinal numbers use (from the runtime's CLDR data). */
export function pluralCategoriesOf(locale: string): readonly PluralCategory[] {
  const used = new Intl.PluralRules(locale).resolvedOptions().pluralCategories;
  return PLURAL_CATEGORIES.filter((category) => used.includes(category));
}

/** The form for `count` in `locale`: its category's text, else "other". */
export function pluralForm(forms: PluralForms, count: number, locale: string): string {
  return forms[new Intl.PluralRules(locale).select(count)] ?? forms.other;
}

/** The names filled in braces: "{km} km to the {direction}" has km and direction. */
export function placeholdersOf(text: string): string[] {
  return [...new Set([...text.matchAll(/\{(\w+)\}/g)].map((m) => m[1] as string))].sort();
}
