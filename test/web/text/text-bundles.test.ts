import { copyFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, test } from 'vitest';
import {
  BundleFileError,
  SHIPPED_TEXT_DIR,
  loadTextBundles,
} from '../../../web/text/text-bundles.ts';
import { translator } from '../../../web/text/translator.ts';
import { tempDir } from '../../service/helpers/service-process.ts';

const dirs: { remove(): void }[] = [];
afterEach(() => dirs.splice(0).forEach((d) => d.remove()));

/** A text folder with the shipped English and the given files. */
function textDir(files: Record<string, unknown>): string {
  const dir = tempDir('tremora-text-');
  dirs.push(dir);
  copyFileSync(join(SHIPPED_TEXT_DIR, 'en.json'), join(dir.path, 'en.json'));
  for (const [name, content] of Object.entries(files))
    writeFileSync(
      join(dir.path, name),
      typeof content === 'string' ? content : JSON.stringify(content),
    );
  return dir.path;
}

const ESPERANTO = {
  language: { code: 'eo', name: 'Esperanto' },
  text: { 'lang.label': 'Lingvo', 'nav.studies': 'Studoj' },
};

describe('text bundles are data files', () => {
  test('the shipped folder has English and French, English first, each named in itself', () => {
    const bundles = loadTextBundles({ textDir: SHIPPED_TEXT_DIR });
    expect(bundles.languages.map((l) => [l.code, l.name])).toEqual([
      ['en', 'English'],
      ['fr', 'Français'],
    ]);
  });

  test('a file added to the folder is a language, its locale its code unless it says', () => {
    const bundles = loadTextBundles({ textDir: textDir({ 'eo.json': ESPERANTO }) });
    expect(bundles.languages.map((l) => l.code)).toEqual(['en', 'eo']);
    const eo = translator('eo', bundles);
    expect(eo.locale).toBe('eo');
    expect(eo.t('lang.label')).toBe('Lingvo');
    expect(eo.has('site.skip')).toBe(false);
    expect(eo.t('site.skip')).toBe('Skip to the main content');
  });

  test('TREMORA_TEXT_DIR sets the folder when no option does', () => {
    const dir = textDir({ 'eo.json': ESPERANTO });
    const before = process.env.TREMORA_TEXT_DIR;
    process.env.TREMORA_TEXT_DIR = dir;
    try {
      expect(loadTextBundles().has('eo')).toBe(true);
    } finally {
      if (before === undefined) delete process.env.TREMORA_TEXT_DIR;
      else process.env.TREMORA_TEXT_DIR = before;
    }
  });

  test('an imported bundle wins key by key over the shipped one of its language', () => {
    const imported = tempDir('tremora-imported-');
    dirs.push(imported);
    writeFileSync(
      join(imported.path, 'eo.json'),
      JSON.stringify({ language: ESPERANTO.language, text: { 'lang.label': 'La lingvo' } }),
    );
    const bundles = loadTextBundles({
      textDir: textDir({ 'eo.json': ESPERANTO }),
      importedDir: imported.path,
    });
    expect(bundles.get('eo')?.text).toEqual({ 'lang.label': 'La lingvo', 'nav.studies': 'Studoj' });
  });

  test('a broken file is refused with its path and what was expected', () => {
    const bad = (files: Record<string, unknown>) => () =>
      loadTextBundles({ textDir: textDir(files) });
    expect(bad({ 'eo.json': '{ "language": ' })).toThrow(/eo\.json: not a JSON text bundle/);
    expect(bad({ 'eo.json': { ...ESPERANTO, language: { code: 'eo', name: ' ' } } })).toThrow(
      /eo\.json: language\.name: the language’s name in itself/,
    );
    expect(bad({ 'xx.json': ESPERANTO })).toThrow(/a bundle for "eo" is named eo\.json/);
    expect(
      bad({ 'eo.json': { ...ESPERANTO, text: { 'plot.branch': { one: '{n} linio' } } } }),
    ).toThrow(/needs an "other" form/);
    expect(bad({})).not.toThrow();
    const noEnglish = tempDir('tremora-text-');
    dirs.push(noEnglish);
    expect(() => loadTextBundles({ textDir: noEnglish.path })).toThrow(BundleFileError);
  });
});
