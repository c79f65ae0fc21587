import { copyFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { PluralForms } from '../../../web/text/plural-forms.ts';
import { SHIPPED_TEXT_DIR, loadTextBundles } from '../../../web/text/text-bundles.ts';
import type { TextKey } from '../../../web/text/text-key.ts';
import { tempDir } from '../../service/helpers/service-process.ts';

const shipped = loadTextBundles({ textDir: SHIPPED_TEXT_DIR });

const oneText = (entry: string | PluralForms): string =>
  typeof entry === 'string' ? entry : entry.other;

/** The shipped English texts (a plural text as its "other" form), read from en.json. */
export const EN = Object.fromEntries(
  Object.entries(shipped.english.text).map(([k, v]) => [k, oneText(v as string | PluralForms)]),
) as Readonly<Record<TextKey, string>>;

/** The shipped French texts (a plural text as its "other" form), read from fr.json. */
export const FR = Object.fromEntries(
  Object.entries(shipped.get('fr')?.text ?? {}).map(([k, v]) => [
    k,
    oneText(v as string | PluralForms),
  ]),
) as Readonly<Partial<Record<TextKey, string>>>;

/** The sections, and single texts, a partly translated French keeps in partialFrenchTextDir. */
const PARTIAL_PREFIXES = [
  ...['site', 'nav', 'lang', 'footer', 'numbers', 'caution', 'chance', 'place', 'compass'],
  ...['band', 'firmness', 'safety', 'error', 'priority', 'trip', 'visits', 'deleteStudy'],
  ...['draft', 'duplicateStudy', 'newStudy', 'renameStudy', 'studyActions', 'studyForm'],
  'source',
];
const PARTIAL_KEYS = [
  ...['editor.sourceChecks', 'home.title', 'home.new', 'tsunami.title', 'limits.title'],
  ...['overview.col.rank', 'overview.col.community', 'overview.col.band', 'map.contourDepth'],
];

/**
 * A text folder with the shipped English and a French that has only the frame of every page,
 * the caution, numbers, directions, bands, the safety advice and the visit planning: the rest
 * falls back to English, as a language being translated does.
 */
export function partialFrenchTextDir(): { path: string; remove(): void } {
  const dir = tempDir('tremora-text-');
  copyFileSync(join(SHIPPED_TEXT_DIR, 'en.json'), join(dir.path, 'en.json'));
  const text = Object.fromEntries(
    Object.entries(shipped.get('fr')?.text ?? {}).filter(
      ([key]) =>
        PARTIAL_PREFIXES.includes(key.slice(0, key.indexOf('.'))) || PARTIAL_KEYS.includes(key),
    ),
  );
  const language = { code: 'fr', name: 'Français (en partie)', locale: 'fr' };
  writeFileSync(join(dir.path, 'fr.json'), JSON.stringify({ language, text }));
  return dir;
}
