import { describe, expect, test } from 'vitest';
import { kmlText, xlsxBytes } from '../../study/community-files/fixtures.ts';
import { runFinished, pagesWithSmallStudy } from '../helpers/page-app.ts';

/**
 * The editor's communities upload with files people keep (app.request): a workbook whose
 * position columns are not recognised asks for them by the file's own column names, carries
 * the file back, saves nothing until they are chosen; then the other columns appear on the
 * community page.
 */
const pages = pagesWithSmallStudy('Import fixture');

const document = () => pages.page.ctx.store.studies.get(pages.studyId)?.document;
const upload = (form: FormData) =>
  pages.page.app.request(`/studies/${pages.studyId}/edit/communities-csv`, {
    method: 'POST',
    body: form,
  });

/** The value of the hidden input `name` in a page. */
const hidden = (html: string, name: string) =>
  new RegExp(`<input type="hidden" name="${name}" value="([^"]*)"`).exec(html)?.[1];

// The community sits where the fixture's point source is (smallStudy), so the run has a result for it.
const WORKBOOK = xlsxBytes([
  ['Village', 'Pos S', 'Pos W', 'Site class', 'School', 'Airstrip'],
  ['Test Cove', -47.4, -140.2, 'C', 'primary, 40 pupils', 'none'],
]);

describe('communities upload from the editor', () => {
  test("unrecognised position columns are asked for from the file's columns; nothing is saved meanwhile", async () => {
    const before = document();
    const form = new FormData();
    form.set('file', new File([WORKBOOK], 'villages.xlsx'));
    const response = await upload(form);
    expect(response.status).toBe(422);
    const html = await response.text();
    expect(html).toContain('no column recognised for latitude (degrees north)');
    for (const key of ['lat', 'lon']) {
      const select =
        new RegExp(`<select id="pick-${key}" name="column\\.${key}">(.*?)</select>`).exec(
          html,
        )?.[1] ?? '';
      expect([...select.matchAll(/<option value="([^"]*)"/g)].map((m) => m[1])).toEqual([
        '',
        'Village',
        'Pos S',
        'Pos W',
        'Site class',
        'School',
        'Airstrip',
      ]);
    }
    expect(html).not.toContain('id="pick-name"');
    expect(hidden(html, 'fileName')).toBe('villages.xlsx');
    expect(Buffer.from(hidden(html, 'fileData') as string, 'base64')).toEqual(
      Buffer.from(WORKBOOK),
    );
    expect(document()).toBe(before);

    const pick = new FormData();
    pick.set('fileName', 'villages.xlsx');
    pick.set('fileData', hidden(html, 'fileData') as string);
    pick.set('column.lat', 'Pos S');
    pick.set('column.lon', 'Pos W');
    const saved = await upload(pick);
    expect(saved.status).toBe(303);
    expect(JSON.parse(document() as string).communities).toBe('communities.csv');
    expect(pages.page.ctx.store.studies.latestFile(pages.studyId, 'communities-csv')).toBe(
      'id,name,lon,lat,vs30,siteClass,population,coastal,elevationM,School,Airstrip\ntest-cove,Test Cove,-140.2,-47.4,,C,,false,,"primary, 40 pupils",none\n',
    );
  });

  test('the kept columns are shown on the community page', async () => {
    const started = await pages.page.app.request(`/studies/${pages.studyId}/screen`, {
      method: 'POST',
      body: new URLSearchParams(),
    });
    const runId = (started.headers.get('location') as string).split('/').at(-1) as string;
    expect(await runFinished(pages.page.ctx, runId)).toBe('done');
    const html = await (
      await pages.page.app.request(`/studies/${pages.studyId}/communities/test-cove`)
    ).text();
    expect(html).toContain('<dt>School</dt><dd>primary, 40 pupils</dd>');
    expect(html).toContain('<dt>Airstrip</dt><dd>none</dd>');
  });

  test('a file that cannot be read is named with what was expected, and nothing is saved', async () => {
    const before = document();
    const form = new FormData();
    form.set('file', new File([kmlText([])], 'villages.kml'));
    const response = await upload(form);
    expect(response.status).toBe(422);
    expect(await response.text()).toContain(
      'villages.kml: expected KML with at least one Placemark (one point per community), found none',
    );
    expect(document()).toBe(before);
  });
});
