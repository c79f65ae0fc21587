import { Fragment, jsx, type Child } from 'hono/jsx';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { ACCESS_COOKIE, accessCookieValue } from '../../../api/service/page-access.ts';
import type { TextKey } from '../../../web/text/text-key.ts';
import { loadTextBundles } from '../../../web/text/text-bundles.ts';
import { EN, partialFrenchTextDir } from '../helpers/bundles.ts';
import { translator } from '../../../web/text/translator.ts';
import { smallStudy } from '../../service/helpers/small-study.ts';
import { fileForm, runFinished, startPageApp, type PageApp } from '../helpers/page-app.ts';
import { textLanguages, type MarkedText } from '../helpers/text-languages.ts';
import { saveDemoStudy, saveStudy } from '../../service/helpers/saved-study.ts';

/**
 * English standing in for a missing translation is marked lang="en", so that readers and
 * screen readers know its language (WCAG 2.2, success criterion 3.1.2 "Language of Parts").
 * The French here is partial on purpose (partialFrenchTextDir): a language being translated.
 */
const textDir = partialFrenchTextDir();
afterAll(() => textDir.remove());
const bundles = loadTextBundles({ textDir: textDir.path });
const FR = bundles.get('fr')?.text ?? {};
const fr = translator('fr', bundles);
const en = translator('en', bundles);
const render = async (child: Child): Promise<string> =>
  String(await jsx(Fragment, {}, child).toString());

describe('the translator marks English standing in for French', () => {
  test('a French text is the text itself, unmarked', async () => {
    expect(fr.has('caution.title')).toBe(true);
    expect(fr.text('caution.title')).toBe(FR['caution.title']);
    expect(fr.fallbackLang('caution.title')).toBeUndefined();
    expect(fr.text('chance.oneIn', { n: 8 })).toBe('environ 1 sur 8');
  });

  test('a missing one comes inside <span lang="en">', async () => {
    expect(fr.has('community.levels')).toBe(false);
    expect(await render(fr.text('community.levels'))).toBe(
      '<span lang="en">What the shaking could be like</span>',
    );
    expect(fr.fallbackLang('community.levels')).toBe('en');
  });

  test("values filled into an English stand-in keep the page's language", async () => {
    const html = await render(fr.text('community.level', { period: fr.number(2475) }));
    // fr-FR groups thousands with a narrow no-break space (U+202F) in ICU's CLDR data (from memory).
    expect(html).toBe(
      '<span lang="en">Shaking reached on average once in <span lang="fr">2\u202f475</span> years</span>',
    );
  });

  test('a value that is itself page content is kept as it is, marked or not', async () => {
    const levelMmi = await render(
      fr.text('community.levelMmi', { mmi: fr.mmi(7.2), name: fr.text('mmi.7.name') }),
    );
    expect(levelMmi).toBe(
      '<span lang="en"><span lang="fr">MMI VII</span>: <span lang="en">Damaging</span></span>',
    );
    const inFrench = await render(
      fr.text('chance.overYears', {
        frequency: fr.text('chance.oneIn', { n: 8 }),
        years: 50,
        percent: fr.text('community.levels'),
      }),
    );
    expect(inFrench).toBe(
      'environ 1 sur 8 au cours des 50 prochaines années (<span lang="en">What the shaking could be like</span>)',
    );
  });

  test('a placeholder without a value stays visible, as fill leaves it', async () => {
    expect(await render(fr.text('community.level'))).toBe(
      '<span lang="en">Shaking reached on average once in {period} years</span>',
    );
  });

  test('on an English page nothing is marked', async () => {
    expect(en.text('community.levels')).toBe(EN['community.levels']);
    expect(en.text('community.level', { period: '475' })).toBe(
      'Shaking reached on average once in 475 years',
    );
    expect(en.fallbackLang('community.levels')).toBeUndefined();
    expect(en.english('expected a number')).toBe('expected a number');
  });

  test("the service's own messages, English on every page, are marked on a French page", async () => {
    expect(await render(fr.english('expected a number in [-90, 90] degrees, got 95'))).toBe(
      '<span lang="en">expected a number in [-90, 90] degrees, got 95</span>',
    );
  });
});

/**
 * The words of each English text French lacks, split at its placeholders and lines: pieces of
 * two words or more are looked for inside the page's text, single words as a whole text.
 */
const fallbackPieces = (Object.keys(EN) as TextKey[])
  .filter((key) => FR[key] === undefined)
  .flatMap((key) =>
    EN[key]
      .split(/\{\w+\}|\n/)
      .map((piece) => ({ key, piece: piece.trim().replace(/^[\s,.:;()]+|[\s,.:;()]+$/g, '') })),
  )
  .filter(({ piece }) => (piece.match(/\p{L}+/gu) ?? []).some((word) => word.length >= 3));

const wordCount = (text: string) => (text.match(/\p{L}+/gu) ?? []).length;

/** The English stand-ins found in text marked French. */
function unmarkedEnglish(found: readonly MarkedText[]): string[] {
  const problems: string[] = [];
  for (const item of found) {
    if (item.lang !== 'fr') continue;
    for (const { key, piece } of fallbackPieces) {
      const hit =
        wordCount(piece) >= 2
          ? item.text.includes(piece)
          : item.text.trim().replace(/[\s:.]+$/, '') === piece;
      if (hit)
        problems.push(`${item.kind} "${item.text.trim().slice(0, 80)}" holds "${piece}" (${key})`);
    }
  }
  return problems;
}

describe('French pages mark every English stand-in', { timeout: 120_000 }, () => {
  const TOKEN = 'token-for-tests-0123456789';
  // The access cookie is added once the service has recorded an access (beforeAll).
  const headers = { cookie: 'tremora_lang=fr' };
  let app: PageApp;
  let smallId: string;
  let demoId: string;
  let runId: string;
  const get = (path: string) => app.app.request(path, { headers });
  const post = (path: string, body: FormData | URLSearchParams) =>
    app.app.request(path, { method: 'POST', headers, body });

  beforeAll(async () => {
    app = startPageApp({ token: TOKEN, textDir: textDir.path });
    const now = new Date();
    const accessId = app.ctx.store.pageAccess.open(now, new Date(now.getTime() + 3_600_000));
    headers.cookie += `; ${ACCESS_COOKIE}=${accessCookieValue(TOKEN, accessId)}`;
    smallId = saveStudy(app.ctx.store, smallStudy('Language fixture'));
    demoId = saveDemoStudy(app.ctx.store);
    const started = await post(`/studies/${smallId}/screen`, new URLSearchParams());
    runId = (started.headers.get('location') as string).split('/').at(-1) as string;
    expect(await runFinished(app.ctx, runId)).toBe('done');
    expect(
      (await post(`/studies/${demoId}/catalog`, fileForm('x', 'text/plain', '', { demo: '1' })))
        .status,
    ).toBe(303);
  });
  afterAll(async () => app?.close());

  const pages: readonly [string, () => Response | Promise<Response>][] = [
    ['home', () => get('/')],
    ['limits', () => get('/limits')],
    [
      'access',
      () =>
        app.app.request('/access?why=needed&back=/', { headers: { cookie: 'tremora_lang=fr' } }),
    ],
    ['access, granted', () => get('/access')],
    [
      'access, wrong token',
      () =>
        app.app.request('/access', {
          method: 'POST',
          headers: { cookie: 'tremora_lang=fr' },
          body: new URLSearchParams({ token: 'not-the-token-0000000' }),
        }),
    ],
    ['overview', () => get(`/studies/${smallId}`)],
    ['run', () => get(`/studies/${smallId}/runs/${runId}`)],
    ['community', () => get(`/studies/${smallId}/communities/test-cove`)],
    ['handout', () => get(`/studies/${smallId}/communities/test-cove/handout`)],
    [
      'scenario',
      () =>
        post(
          `/studies/${smallId}/scenario`,
          new URLSearchParams({ sourceId: 'spot-below', magnitude: '6.5' }),
        ),
    ],
    [
      'scenario, bad magnitude',
      () =>
        post(
          `/studies/${smallId}/scenario`,
          new URLSearchParams({ sourceId: 'spot-below', magnitude: '12' }),
        ),
    ],
    ['editor', () => get(`/studies/${smallId}/edit`)],
    [
      'community form with problems',
      () =>
        post(
          `/studies/${smallId}/edit/new-community`,
          new URLSearchParams({ id: 'x', name: '', lon: '500', lat: 'north' }),
        ),
    ],
    ['catalog', () => get(`/studies/${demoId}/catalog`)],
    ['not found', () => get('/no/such/page')],
  ];

  for (const [name, load] of pages) {
    test(`${name}: no English text or spoken attribute is left marked French`, async () => {
      const response = await load();
      const html = await response.text();
      expect(html, name).toContain('<html lang="fr">');
      expect(unmarkedEnglish(textLanguages(html)), name).toEqual([]);
    });
  }

  test('the check finds English that is not marked', () => {
    const found = textLanguages(
      `<html lang="fr"><p>${EN['community.levelIntro']}</p><p lang="en">${EN['community.curveIntro']}</p></html>`,
    );
    expect(unmarkedEnglish(found)).toEqual([
      `text "${EN['community.levelIntro'].slice(0, 80)}" holds "${EN['community.levelIntro'].replace(/\.$/, '')}" (community.levelIntro)`,
    ]);
  });
});
