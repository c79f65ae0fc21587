import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { TextEntry } from './plural-forms.ts';
import { isLanguageCode, type Language } from './text-bundles.ts';
import type { TextKey } from './text-key.ts';

/**
 * Saves an imported translation as `<dir>/<code>.json`, a bundle file like the shipped ones
 * (text-bundles.ts), replacing the language's earlier import. The file is written beside and
 * then renamed over, so a failed write never leaves half a bundle.
 */
export function saveImportedBundle(
  dir: string,
  language: Language,
  text: Partial<Record<TextKey, TextEntry>>,
): string {
  // The code names the file: only a language code (letters, digits, hyphens) may, never a path.
  if (!isLanguageCode(language.code))
    throw new Error(`expected a language code such as "fr" or "pt-BR", got "${language.code}"`);
  mkdirSync(dir, { recursive: true });
  const path = join(dir, `${language.code}.json`);
  const partial = `${path}.${process.pid}.partial`;
  writeFileSync(partial, `${JSON.stringify({ language, text }, null, 2)}\n`);
  renameSync(partial, path);
  return path;
}
