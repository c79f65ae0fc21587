import { jsx, type Child } from 'hono/jsx';
import { intensityWords } from '../format/intensity-words.ts';
import { pluralForm, type TextEntry } from './plural-forms.ts';
import { shippedTextBundles, type Language, type TextBundles } from './text-bundles.ts';
import type { PluralKey, TextKey } from './text-key.ts';
import { naturalFrequency, percentText } from '../format/natural-frequency.ts';
import { numberInWords } from '../format/number-words.ts';
import { placeFrom, type Compass } from '../format/direction-words.ts';

/** A language's code (BCP 47), as its bundle file names it (text-bundles.ts). */
export type LanguageCode = string;
export const DEFAULT_LANGUAGE: LanguageCode = 'en';

export type TextValues = Readonly<Record<string, string | number>>;

/** Fills "{name}" placeholders; a placeholder without a value is left as it is, to be seen and fixed. */
export function fill(template: string, values: TextValues = {}): string {
  return template.replace(/\{(\w+)\}/g, (whole, name: string) =>
    name in values ? String(values[name]) : whole,
  );
}

/** Values filled into page content: plain values, or content made by Translator.text. */
export type ContentValues = Readonly<Record<string, Child>>;

/** Like fill, for page content: the template's pieces and its values, in order. */
function fillPieces(
  template: string,
  values: ContentValues,
  wrap: (value: Child) => Child,
): Child[] {
  const pieces: Child[] = [];
  let from = 0;
  for (const match of template.matchAll(/\{(\w+)\}/g)) {
    const name = match[1] as string;
    if (!(name in values)) continue;
    pieces.push(template.slice(from, match.index), wrap(values[name]));
    from = match.index + match[0].length;
  }
  pieces.push(template.slice(from));
  return pieces.filter((piece) => piece !== '');
}

const isPlain = (piece: Child): piece is string | number =>
  typeof piece === 'string' || typeof piece === 'number';

export interface Translator {
  readonly lang: LanguageCode;
  /** Every language with a bundle, for the language switch. */
  readonly languages: readonly Language[];
  /** The BCP 47 tag for number and date formats. */
  readonly locale: string;
  /** The text for `key` in this language, or in English when the bundle lacks it. */
  t(key: TextKey, values?: TextValues): string;
  /**
   * A plural text: the form for `count` by this language's plural rules (Intl.PluralRules),
   * as page content like text(); {n} is `count` in this language's number format unless given.
   */
  plural(key: PluralKey, count: number, values?: ContentValues): Child;
  /** Whether this language's own bundle has `key` (false: the English fallback is used). */
  has(key: TextKey): boolean;
  /**
   * The text for `key` as page content. Where English stands in for a missing translation it
   * comes inside <span lang="en">, so that readers and screen readers know its language
   * (WCAG 2.2, success criterion 3.1.2, Language of Parts); the values filled into such a
   * text keep this page's language. Attributes, <title>, <option> and SVG text cannot hold
   * a span: those take t() and, where needed, lang={fallbackLang(key)} on their element.
   */
  text(key: TextKey, values?: ContentValues): Child;
  /** "en" when English stands in for `key` on a page in another language; else undefined. */
  fallbackLang(key: TextKey): LanguageCode | undefined;
  /**
   * Text that is English whatever the page's language (the service's messages: problems with
   * an input, warnings, why a run failed), marked as such on a page in another language.
   */
  english(message: string): Child;
  number(value: number, fractionDigits?: number): string;
  /** Whole numbers 0–10 in words, larger in digits (format/number-words.ts). */
  count(value: number): string;
  /** "about 1 in 8 over the next 50 years (12%)" and its parts. */
  chance(probability: number): { readonly frequency: string; readonly percent: string };
  /** An MMI value in words: "MMI VI" or "MMI VI, almost VII" (format/intensity-words.ts). */
  mmi(value: number): string;
  /** "14 km to the north-east", "right beside this place", "about 40 km below this place" or "right under this place" (direction-words.ts). */
  place(distanceKm: number, bearingDeg: number, depthBelowKm?: number): string;
  compass(point: Compass): string;
  /**
   * "to the east": the direction with its article and preposition, written whole in each
   * language, since they change with the word (French "au nord" but "à l'est").
   */
  toward(point: Compass): string;
  date(iso: string | number): string;
}

/** The text of an entry: a plural entry gives the form for `count` (or "other"). */
const entryText = (entry: TextEntry, count: number | undefined, locale: string): string =>
  typeof entry === 'string'
    ? entry
    : count === undefined
      ? entry.other
      : pluralForm(entry, count, locale);

/**
 * A translator for `lang` (English when `bundles` has no such language), with English as the
 * fallback for every missing key.
 */
export function translator(
  lang: LanguageCode,
  bundles: TextBundles = shippedTextBundles(),
): Translator {
  const english = bundles.english;
  const bundle = bundles.get(lang) ?? english;
  const own = bundle.text;
  const { code, locale } = bundle.language;
  const englishText = (key: TextKey, count?: number): string =>
    entryText(english.text[key] ?? key, count, english.language.locale);
  const ownText = (key: TextKey, count?: number): string | undefined => {
    const entry = own[key];
    return entry === undefined ? undefined : entryText(entry, count, locale);
  };
  const text = (key: TextKey): string => ownText(key) ?? englishText(key);
  const t = (key: TextKey, values?: TextValues) => fill(text(key), values);
  const content = (key: TextKey, values: ContentValues, count?: number): Child => {
    const mine = ownText(key, count);
    if (mine !== undefined) {
      const pieces = fillPieces(mine, values, (value) => value);
      return pieces.every(isPlain) ? pieces.join('') : pieces;
    }
    const pageLanguage = (value: Child) =>
      isPlain(value) ? jsx('span', { lang: code }, String(value)) : value;
    return jsx(
      'span',
      { lang: DEFAULT_LANGUAGE },
      ...fillPieces(englishText(key, count), values, pageLanguage),
    );
  };
  const self: Translator = {
    lang: code,
    languages: bundles.languages,
    locale,
    t,
    has: (key) => own[key] !== undefined,
    text: (key, values = {}) => content(key, values),
    plural: (key, count, values = {}) => content(key, { n: self.number(count), ...values }, count),
    fallbackLang: (key) => (own[key] === undefined ? DEFAULT_LANGUAGE : undefined),
    english: (message) =>
      code === DEFAULT_LANGUAGE ? message : jsx('span', { lang: DEFAULT_LANGUAGE }, message),
    number: (value, fractionDigits = 0) =>
      new Intl.NumberFormat(locale, {
        minimumFractionDigits: fractionDigits,
        maximumFractionDigits: fractionDigits,
      }).format(value),
    count: (value) =>
      numberInWords(value, { smallNumbers: text('numbers.small').split('|'), locale }),
    chance: (probability) => {
      const f = naturalFrequency(probability);
      const frequency =
        f.kind === 'less-than'
          ? t('chance.lessThan', { n: self.number(f.n) })
          : f.kind === 'one-in'
            ? t('chance.oneIn', { n: self.number(f.n) })
            : f.kind === 'in-ten'
              ? t('chance.inTen', { k: f.k })
              : t('chance.moreThanNine');
      const p = percentText(probability);
      const percent =
        p === '<0.1'
          ? t('chance.percentBelow', { p: self.number(0.1, 1) })
          : t('chance.percent', { p: p.includes('.') ? self.number(Number(p), 1) : p });
      return { frequency, percent };
    },
    mmi: (value) => {
      const words = intensityWords(value);
      return words.almost === undefined
        ? t('mmi.label', { roman: words.roman })
        : t('mmi.almost', { roman: words.roman, next: words.almost });
    },
    place: (distanceKm, bearingDeg, depthBelowKm) => {
      const where = placeFrom(distanceKm, bearingDeg, depthBelowKm);
      if (where.kind === 'here') return t('place.here');
      if (where.kind === 'beside') return t('place.beside');
      if (where.kind === 'below') return t('place.below', { km: self.number(where.depthKm) });
      return t('place.away', {
        km: self.number(where.distanceKm),
        direction: self.toward(where.compass),
      });
    },
    compass: (point) => t(`compass.${point}` as TextKey),
    toward: (point) => t(`compass.toward.${point}` as TextKey),
    date: (when) =>
      new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' }).format(
        new Date(when),
      ),
  };
  return self;
}
