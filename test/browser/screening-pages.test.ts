import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import type { StudyResult } from '../../api/engine/results.ts';
import { translator } from '../../web/text/translator.ts';
import { ARTIFACTS, pdfPageCount, seriousAxeViolations, walkWithTab } from './helpers/chromium.ts';
import { browserService, noScriptOverview } from './helpers/browser-service.ts';

/**
 * A new user's path through the demo coast in Chromium: open the overview, screen the study,
 * read the ranking and a village page, print the handout, run a scenario, load the catalog.
 * Every view is checked with axe-core and walked with the Tab key; no request may leave the
 * service's origin. Screenshots go to test-artifacts/.
 */
let results: StudyResult;
const en = translator('en');

/** Band order of the ranking rule (web/data/ranking.ts), written out here for the check. */
const BAND_ORDER = ['refer-first', 'refer-soon', 'prepare', 'inform'];

const rig = browserService({
  tempPrefix: 'tremora-browser-',
  database: 'browser.db',
});

/** axe-core and the Tab walk on the page as it stands. */
async function checkView(name: string): Promise<void> {
  const violations = await seriousAxeViolations(rig.page);
  expect(
    violations,
    `${name}: serious or critical axe-core violations\n${JSON.stringify(violations, null, 2)}`,
  ).toEqual([]);
  const walk = await walkWithTab(rig.page);
  expect(walk.controls.length, `${name}: controls found`).toBeGreaterThan(0);
  expect(walk.missed, `${name}: controls Tab never reached`).toEqual([]);
  expect(walk.invisibleFocus, `${name}: controls focused without a visible focus ring`).toEqual([]);
}

describe('the checks themselves', () => {
  test('axe-core and the Tab walk do find faults when there are some', async () => {
    const probe = await rig.context.newPage();
    await probe.setContent(
      '<html><head><title>probe</title></head><body><main><img src="data:,"><button class="plain">Go</button><input id="x"><style>.plain:focus{outline:none}</style></main></body></html>',
    );
    const violations = await seriousAxeViolations(probe);
    expect(violations.map((v) => v.id)).toEqual(expect.arrayContaining(['image-alt', 'label']));
    const walk = await walkWithTab(probe);
    expect(walk.invisibleFocus).toEqual(['button "Go"']);
    await probe.close();
  });
});

describe('the demo coast in a browser', { timeout: 180_000 }, () => {
  test('a new user opens the overview and screens the study with one button; the page follows the run', async () => {
    await rig.page.goto(`${rig.service.url}/`);
    await checkView('home');
    await rig.page.getByRole('link', { name: 'Demo coast', exact: true }).click();
    await expect.poll(() => rig.page.url()).toBe(`${rig.service.url}/studies/${rig.studyId}`);
    await rig.page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await rig.page.waitForURL(/\/runs\//);
    await checkView('run progress');
    // The page's script follows the run and moves to the overview when it is done.
    await rig.page.waitForURL(`${rig.service.url}/studies/${rig.studyId}`, { timeout: 300_000 });
    await expect.poll(() => rig.page.locator('table.ranking tbody tr').count()).toBe(11);
    await rig.page.screenshot({ path: join(ARTIFACTS, 'overview.png'), fullPage: true });
    await checkView('overview');
  }, 320_000);

  test("the ranking matches the API's results", async () => {
    const { runs } = (await (
      await rig.service.fetch(`/api/studies/${rig.studyId}/runs`)
    ).json()) as {
      runs: { id: string; status: string }[];
    };
    const done = runs.filter((r) => r.status === 'done').at(-1) as { id: string };
    results = (await (
      await rig.service.fetch(`/api/runs/${done.id}/results`)
    ).json()) as StudyResult;
    const { document } = (await (
      await rig.service.fetch(`/api/studies/${rig.studyId}`)
    ).json()) as {
      document: { communities: { id: string; population?: number }[] };
    };
    const people = new Map(document.communities.map((c) => [c.id, c.population ?? -1]));
    const expected = [...results.communities]
      .sort(
        (a, b) =>
          BAND_ORDER.indexOf(a.band.id) - BAND_ORDER.indexOf(b.band.id) ||
          (b.intensity.chanceOfReaching['50']?.VII ?? 0) -
            (a.intensity.chanceOfReaching['50']?.VII ?? 0) ||
          (people.get(b.communityId) as number) - (people.get(a.communityId) as number),
      )
      .map((c) => ({
        id: c.communityId,
        band: c.band.id,
        vii: c.intensity.chanceOfReaching['50']?.VII,
      }));
    const shown = await rig.page.locator('table.ranking tbody tr').evaluateAll((rows) =>
      rows.map((row) => ({
        id: row.getAttribute('data-community'),
        band: row.querySelector('[data-band]')?.getAttribute('data-band'),
        vii: Number(row.querySelector('[data-probability]')?.getAttribute('data-probability')),
        text: row.querySelector('[data-probability]')?.textContent?.trim(),
      })),
    );
    expect(shown.map(({ id, band, vii }) => ({ id, band, vii }))).toEqual(expected);
    for (const row of shown) {
      const c = en.chance(row.vii);
      expect(row.text).toBe(`${c.frequency} (${c.percent})`);
    }
  });

  test('sorting: the column links sort with the script, and without it', async () => {
    await rig.page
      .getByRole('link', { name: new RegExp(`^${en.t('overview.col.people')}`) })
      .click();
    const people = await rig.page
      .locator('table.ranking tbody tr [data-key="people"]')
      .evaluateAll((cells) => cells.map((c) => Number(c.getAttribute('data-value'))));
    expect(people).toEqual([...people].sort((a, b) => b - a));
    expect(await rig.page.locator('th[aria-sort="descending"]').count()).toBe(1);
    expect(rig.page.url()).toContain('sort=people');

    const {
      context: plain,
      page: noScript,
      foreignRequests: plainForeign,
    } = await noScriptOverview(rig);
    await noScript
      .getByRole('link', { name: new RegExp(`^${en.t('overview.col.people')}`) })
      .click();
    await noScript.waitForURL(/sort=people&dir=descending/);
    const plainPeople = await noScript
      .locator('table.ranking tbody tr [data-key="people"]')
      .evaluateAll((cells) => cells.map((c) => Number(c.getAttribute('data-value'))));
    expect(plainPeople).toEqual(people);
    await plain.close();
    expect(plainForeign).toEqual([]);
  });

  test("a community page's headline numbers equal the run's numbers", async () => {
    const harbour = results.communities.find((c) => c.communityId === 'harbour-point');
    expect(harbour).toBeDefined();
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/communities/harbour-point`);
    const headline = rig.page.locator('p.headline');
    const vii = harbour?.intensity.chanceOfReaching['50']?.VII as number;
    expect(Number(await headline.getAttribute('data-probability'))).toBe(vii);
    const c = en.chance(vii);
    expect(await headline.textContent()).toBe(
      en.t('community.headline', {
        name: 'Harbour Point',
        chance: c.frequency,
        years: 50,
        percent: c.percent,
      }),
    );
    for (const roman of ['VI', 'VII', 'VIII'] as const) {
      expect(
        Number(
          await rig.page
            .locator(`.other-chances [data-mmi="${roman}"]`)
            .getAttribute('data-probability'),
        ),
      ).toBe(harbour?.intensity.chanceOfReaching['50']?.[roman]);
    }
    for (const years of ['475', '2475']) {
      expect(
        Number(
          await rig.page
            .locator(`.level-card[data-return-period="${years}"] .level-mmi`)
            .getAttribute('data-mmi'),
        ),
      ).toBe(harbour?.intensity.atReturnPeriod[years]?.mmi);
    }
    // Coastal: the tsunami advice; every page with numbers: the caution and the limits link.
    await expect
      .poll(() => rig.page.getByRole('heading', { name: en.t('tsunami.title') }).count())
      .toBe(1);
    expect(await rig.page.locator('main .caution').textContent()).toContain(en.t('caution.text'));
    expect(await rig.page.locator('main a[href="/limits"]').count()).toBeGreaterThan(0);
    // "Earthquakes people here have likely felt": the counts of the API's felt history of the
    // attached demo catalog, and its strongest events listed.
    const felt = (await (
      await rig.service.fetch(`/api/studies/${rig.studyId}/felt?community=harbour-point`)
    ).json()) as { communities: { felt: unknown[]; stronglyFelt: unknown[] }[] };
    const counts = rig.page.locator('section.felt [data-felt]');
    expect(Number(await counts.getAttribute('data-felt'))).toBe(felt.communities[0]?.felt.length);
    expect(Number(await counts.getAttribute('data-strongly-felt'))).toBe(
      felt.communities[0]?.stronglyFelt.length,
    );
    expect(await rig.page.locator('table.felt-table tbody tr').count()).toBe(
      Math.min(8, felt.communities[0]?.felt.length ?? 0),
    );
    await rig.page.screenshot({ path: join(ARTIFACTS, 'community.png'), fullPage: true });
    await checkView('community page');
  });

  test('every handout prints to PDF in at most two pages, A4 and Letter, with the caution in the repeated footer', async () => {
    for (const community of results.communities) {
      await rig.page.goto(
        `${rig.service.url}/studies/${rig.studyId}/communities/${community.communityId}/handout`,
      );
      for (const format of ['A4', 'Letter'] as const) {
        const pdf = await rig.page.pdf({
          format,
          path:
            community.communityId === 'harbour-point'
              ? join(ARTIFACTS, `handout-${format}.pdf`)
              : undefined,
        });
        const pages = pdfPageCount(pdf);
        expect(pages, `${community.communityId} on ${format}`).toBeGreaterThanOrEqual(1);
        expect(pages, `${community.communityId} on ${format}`).toBeLessThanOrEqual(2);
      }
    }
    await rig.page.goto(
      `${rig.service.url}/studies/${rig.studyId}/communities/harbour-point/handout`,
    );
    await rig.page.emulateMedia({ media: 'print' });
    expect(
      await rig.page.evaluate(
        "getComputedStyle(document.querySelector('table.handout-frame > tfoot')).display",
      ),
    ).toBe('table-footer-group');
    expect(await rig.page.locator('tfoot .handout-caution').textContent()).toContain(
      en.t('caution.short'),
    );
    expect(await rig.page.locator('tfoot .provenance').textContent()).toContain(
      results.provenance.inputHash.slice(0, 12),
    );
    expect(
      await rig.page.evaluate("getComputedStyle(document.querySelector('.handout-tools')).display"),
    ).toBe('none');
    await rig.page.setViewportSize({ width: 794, height: 1123 });
    // Nothing wider than the A4 width (794 px at 96 dpi) once laid out again; then the picture.
    expect(
      await rig.page.evaluate(
        'document.documentElement.scrollWidth <= document.documentElement.clientWidth',
      ),
    ).toBe(true);
    // A viewport as tall as the handout: no scrollbar to take its width from the picture.
    await rig.page.setViewportSize({
      width: 794,
      height: Number(await rig.page.evaluate('document.documentElement.scrollHeight')),
    });
    await rig.page.screenshot({ path: join(ARTIFACTS, 'handout-print.png') });
    await rig.page.emulateMedia({ media: 'screen' });
    await rig.page.setViewportSize({ width: 1100, height: 900 });
    await checkView('handout');
  });

  test('a scenario: pick a source and magnitude, see the map and each community', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/scenario`);
    await checkView('scenario form');
    await rig.page.selectOption('#scenario-source', 'vennick-fault');
    await rig.page.fill('#scenario-magnitude', '6.8');
    await rig.page.getByRole('button', { name: en.t('scenario.run') }).click();
    await rig.page.waitForSelector('table.scenario-table');
    expect(await rig.page.locator('table.scenario-table tbody tr').count()).toBe(11);
    expect(await rig.page.locator('svg .scenario-cells rect').count()).toBeGreaterThan(100);
    await rig.page.screenshot({ path: join(ARTIFACTS, 'scenario.png'), fullPage: true });
    await checkView('scenario result');
  });

  test('the catalog view: the demo catalog attached at seeding, load it again, see the fit, fit a zone', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/catalog`);
    await checkView('catalog view');
    await rig.page.getByRole('button', { name: en.t('catalog.useDemo') }).click();
    await rig.page.waitForSelector('.fit-values');
    expect(Number(await rig.page.locator('.fit-values').getAttribute('data-b'))).toBeGreaterThan(0);
    expect(await rig.page.locator('svg path.fit-line').count()).toBe(1);
    await rig.page.getByRole('button', { name: en.t('catalog.zoneFit') }).click();
    await rig.page.waitForSelector('.zone-result');
    await rig.page.screenshot({ path: join(ARTIFACTS, 'catalog.png'), fullPage: true });
    await checkView('catalog with a fit');
  });

  test('the language switch on every page: the French bundle, read from its file', async () => {
    await rig.page.goto(`${rig.service.url}/limits`);
    await checkView('limits');
    await rig.page.selectOption('#lang-select', 'fr');
    await rig.page.getByRole('button', { name: en.t('lang.change') }).click();
    await rig.page.waitForURL(`${rig.service.url}/limits`);
    expect(await rig.page.locator('html').getAttribute('lang')).toBe('fr');
    expect(await rig.page.locator('h1').textContent()).toBe(
      'Les limites d’une évaluation préliminaire',
    );
    expect(await rig.page.locator('main .lead').textContent()).toBe(
      translator('fr').t('limits.intro'),
    );
    expect(await rig.page.locator('main [lang="en"]').count()).toBe(0);
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/communities/harbour-point`);
    // The band's French name from the bundle, for the band the run gave Harbour Point.
    const harbourBand = results.communities.find((c) => c.communityId === 'harbour-point')?.band.id;
    expect(harbourBand).toBe('refer-first');
    expect(await rig.page.locator('.band-name').first().textContent()).toBe('À signaler d’abord');
    await checkView('community page in French');
    await rig.page.goto(`${rig.service.url}/language?lang=en&back=/`);
    expect(await rig.page.locator('html').getAttribute('lang')).toBe('en');
  });

  test('the editor and a page that does not exist pass the same checks', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit`);
    await checkView('editor');
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit/communities/harbour-point`);
    await checkView('community form');
    const missing = await rig.page.goto(`${rig.service.url}/nowhere`);
    expect(missing?.status()).toBe(404);
    await checkView('not found');
  });

  test("no request left the service's origin", () => {
    expect(rig.foreignRequests).toEqual([]);
  });
});
