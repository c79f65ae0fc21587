import { copyFileSync, existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { SHIPPED_TEXT_DIR } from '../../../web/text/text-bundles.ts';
import { tempDir } from '../../service/helpers/service-process.ts';
import { fileForm, startPageApp, type PageApp } from '../helpers/page-app.ts';

/** The <option>s of the language switch: [code, name]. */
const switchOptions = (html: string): string[][] =>
  [...html.matchAll(/<option value="([^"]+)" lang="[^"]+"[^>]*>([^<]+)<\/option>/g)].map((m) => [
    m[1] as string,
    m[2] as string,
  ]);

describe('languages from data files, and the Languages page', () => {
  const text = tempDir('tremora-text-');
  let app: PageApp;

  beforeAll(() => {
    copyFileSync(join(SHIPPED_TEXT_DIR, 'en.json'), join(text.path, 'en.json'));
    copyFileSync(join(SHIPPED_TEXT_DIR, 'fr.json'), join(text.path, 'fr.json'));
    // A bundle file added to the folder: nothing else changes.
    writeFileSync(
      join(text.path, 'eo.json'),
      JSON.stringify({
        language: { code: 'eo', name: 'Esperanto' },
        text: { 'lang.label': 'Lingvo', 'nav.studies': 'Studoj' },
      }),
    );
    app = startPageApp({ textDir: text.path });
  });
  afterAll(async () => {
    await app.close();
    text.remove();
  });

  test('a language added as a file is in the language switch and can be chosen', async () => {
    const home = await (await app.app.request('/')).text();
    expect(switchOptions(home)).toEqual([
      ['en', 'English'],
      ['eo', 'Esperanto'],
      ['fr', 'Français'],
    ]);
    const chosen = await app.app.request('/language?lang=eo&back=/');
    expect(chosen.headers.get('set-cookie')).toMatch(/^tremora_lang=eo;/);
    const inEsperanto = await (
      await app.app.request('/', { headers: { cookie: 'tremora_lang=eo' } })
    ).text();
    expect(inEsperanto).toContain('<html lang="eo">');
    expect(inEsperanto).toContain('<label for="lang-select">Lingvo</label>');
  });

  test('the Languages page reports what each language lacks and where it shows', async () => {
    const html = await (await app.app.request('/languages')).text();
    expect(html).toMatch(/data-language="eo">\s*<strong lang="eo">Esperanto<\/strong> \(eo\):/);
    expect(html).toContain('<li data-key="site.skip"><code>site.skip</code>');
    expect(html).toContain('Shown on: Every page');
  });

  test('the export is a PO file with the language, or a CSV file', async () => {
    const po = await app.app.request('/languages/export?code=eo&format=po');
    expect(po.headers.get('content-disposition')).toBe('attachment; filename="tremora-eo.po"');
    const body = await po.text();
    expect(body).toContain('msgctxt "lang.label"\nmsgid "Language"\nmsgstr "Lingvo"');
    const csv = await (await app.app.request('/languages/export?code=eo&format=csv')).text();
    expect(csv).toContain('"lang.label","Language","Lingvo"\r\n');
    const bad = await app.app.request('/languages/export?code=../x');
    expect(bad.status).toBe(422);
  });

  test('a file with problems is refused by line and key, and nothing is saved', async () => {
    const csv = 'key,English,translation\r\nlang.label,Language,Lingvo\r\nplace.away,x,{km} km\r\n';
    const res = await app.app.request('/languages/import', {
      method: 'POST',
      body: fileForm('eo.csv', 'text/csv', csv, { code: 'eo' }),
    });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('<li data-line="3" data-key="place.away">');
    expect(html).toContain('missing placeholder {direction}');
    expect(existsSync(join(app.dataDir, 'text', 'eo.json'))).toBe(false);
  });

  test('a good file is saved beside the database and its language shows at once', async () => {
    const exported = await (await app.app.request('/languages/export?code=tok&format=po')).text();
    const translated = exported.replace(
      'msgctxt "lang.label"\nmsgid "Language"\nmsgstr ""',
      'msgctxt "lang.label"\nmsgid "Language"\nmsgstr "toki"',
    );
    const res = await app.app.request('/languages/import', {
      method: 'POST',
      body: fileForm('tok.po', 'text/x-gettext-translation', translated, {
        code: 'tok',
        name: 'toki pona',
      }),
    });
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('1 text imported for toki pona.');
    expect(existsSync(join(app.dataDir, 'text', 'tok.json'))).toBe(true);
    expect(switchOptions(html).map(([code]) => code)).toContain('tok');
  });
});
