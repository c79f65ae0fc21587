import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';
import { PLURAL_CATEGORIES, type TextEntry } from './plural-forms.ts';
import type { TextKey } from './text-key.ts';

/**
 * Text bundles are data files, one per language: web/text/bundles/<code>.json, read at start-up.
 * Adding a file adds a language to the language switch, with no change to the code. Each file
 * names its language in itself:
 *
 *   { "language": { "code": "fr", "name": "Français", "locale": "fr" },
 *     "text": { "site.skip": "Aller au contenu principal", … } }
 *
 * English (en.json) is complete by definition; another language may leave keys out, and each
 * missing key falls back to English (translator.ts). Translations imported from the pages are
 * kept in a second folder (the service's data folder) and read after the shipped ones: for a
 * language in both, the imported text wins key by key.
 */

/** The folder of the shipped bundles, beside this module (also in dist/, api/bin/build.js copies it). */
export const SHIPPED_TEXT_DIR = fileURLToPath(new URL('./bundles/', import.meta.url));

/** A BCP 47 language tag of the simple kind a bundle file is named by: "fr", "pt-BR". */
const LANGUAGE_CODE = /^[a-z]{2,3}(-[A-Za-z0-9]{2,8})*$/;

const pluralFormsSchema = z
  .object(Object.fromEntries(PLURAL_CATEGORIES.map((c) => [c, z.string().optional()])))
  .strict()
  .refine((forms) => typeof forms.other === 'string', { message: 'needs an "other" form' });

const bundleFileSchema = z
  .object({
    language: z
      .object({
        code: z.string().regex(LANGUAGE_CODE, 'a language code such as "fr" or "pt-BR"'),
        name: z.string().trim().min(1, 'the language’s name in itself, such as "Français"'),
        locale: z.string().min(1).optional(),
      })
      .strict(),
    text: z.record(z.string(), z.union([z.string(), pluralFormsSchema])),
  })
  .strict();

export interface Language {
  /** The BCP 47 tag, also the file's name and the page's lang attribute. */
  readonly code: string;
  /** The language's name in itself, as the language switch shows it. */
  readonly name: string;
  /** The BCP 47 tag for Intl number, date and plural rules (the code unless the file says). */
  readonly locale: string;
}

export interface TextBundle {
  readonly language: Language;
  readonly text: Readonly<Partial<Record<TextKey, TextEntry>>>;
}

/** A bundle file that cannot be read: the message names the file and what was expected. */
export class BundleFileError extends Error {
  override name = 'BundleFileError';
}

const languageCodeOk = (code: string): boolean => LANGUAGE_CODE.test(code);
export { languageCodeOk as isLanguageCode };

/** Reads and checks one bundle file. */
export function readBundleFile(path: string): TextBundle {
  let data: unknown;
  try {
    data = JSON.parse(readFileSync(path, 'utf8'));
  } catch (error) {
    throw new BundleFileError(
      `${path}: not a JSON text bundle (${error instanceof Error ? error.message : String(error)})`,
    );
  }
  const parsed = bundleFileSchema.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new BundleFileError(
      `${path}: ${issue?.path.join('.') || 'the file'}: ${issue?.message ?? 'not a text bundle'}`,
    );
  }
  const { language, text } = parsed.data;
  const expected = `${language.code}.json`;
  if (!path.endsWith(expected))
    throw new BundleFileError(`${path}: a bundle for "${language.code}" is named ${expected}`);
  return {
    language: {
      code: language.code,
      name: language.name,
      locale: language.locale ?? language.code,
    },
    text: text as TextBundle['text'],
  };
}

function bundlesIn(dir: string): TextBundle[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir)
    .filter((name) => name.endsWith('.json'))
    .sort()
    .map((name) => readBundleFile(join(dir, name)));
}

/** Where bundles are read from. */
export interface TextBundleFolders {
  /** The shipped bundles (default: TREMORA_TEXT_DIR, else SHIPPED_TEXT_DIR). It must hold en.json. */
  readonly textDir?: string | undefined;
  /** Translations imported from the pages (the service's data folder); may not exist yet. */
  readonly importedDir?: string | undefined;
}

/** Every language's bundle, English first, then by code. */
export class TextBundles {
  readonly english: TextBundle;
  private readonly byCode: ReadonlyMap<string, TextBundle>;

  constructor(bundles: readonly TextBundle[]) {
    const byCode = new Map<string, TextBundle>();
    for (const bundle of bundles) {
      const before = byCode.get(bundle.language.code);
      byCode.set(
        bundle.language.code,
        before ? { language: bundle.language, text: { ...before.text, ...bundle.text } } : bundle,
      );
    }
    const english = byCode.get('en');
    if (!english) throw new BundleFileError('the text bundles need an English one, en.json');
    this.english = english;
    this.byCode = byCode;
  }

  /** The languages of the language switch: English first, then by code. */
  get languages(): readonly Language[] {
    return [...this.byCode.values()]
      .map((b) => b.language)
      .sort((a, b) => (a.code === 'en' ? -1 : b.code === 'en' ? 1 : a.code.localeCompare(b.code)));
  }

  has(code: unknown): code is string {
    return typeof code === 'string' && this.byCode.has(code);
  }

  get(code: string): TextBundle | undefined {
    return this.byCode.get(code);
  }
}

/** Reads the bundles of `folders` (a shipped folder without en.json is refused). */
export function loadTextBundles(folders: TextBundleFolders = {}): TextBundles {
  const textDir = folders.textDir ?? process.env.TREMORA_TEXT_DIR ?? SHIPPED_TEXT_DIR;
  const shipped = bundlesIn(textDir);
  const imported = folders.importedDir === undefined ? [] : bundlesIn(folders.importedDir);
  return new TextBundles([...shipped, ...imported]);
}

let shipped: TextBundles | undefined;

/** The shipped bundles, read once (for code that renders text outside a running service). */
export function shippedTextBundles(): TextBundles {
  shipped ??= loadTextBundles();
  return shipped;
}
