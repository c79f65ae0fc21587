import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { smallStudy } from '../../service/helpers/small-study.ts';
import { startPageApp, type PageApp } from '../helpers/page-app.ts';
import { saveStudy } from '../../service/helpers/saved-study.ts';

/**
 * New study, rename, copy and delete from the pages (app.request): a study is created from a
 * name and a small village CSV as a draft without sources, which the overview says; a bad file
 * or a blank name saves nothing; the delete page counts what goes with the study.
 */
let page: PageApp;

beforeAll(() => {
  page = startPageApp();
});
afterAll(async () => page.close());

// Two invented villages in the open-ocean demo region.
const VILLAGES_CSV =
  'Name,Latitude,Longitude,Vs30\nTest Cove,-47.4,-140.2,500\nFar Reef,-47.5,-140.4,760\n';

const newStudy = (name: string, file?: File) => {
  const form = new FormData();
  form.set('name', name);
  if (file) form.set('file', file);
  return page.app.request('/studies/new', { method: 'POST', body: form });
};
const post = (path: string, fields: Record<string, string> = {}) =>
  page.app.request(path, { method: 'POST', body: new URLSearchParams(fields) });
const count = () => page.ctx.store.studies.list().length;

describe('a new study from the pages', () => {
  test('the home page offers it and the form asks for a name and a village file', async () => {
    const home = await (await page.app.request('/')).text();
    expect(home).toContain('href="/studies/new"');
    const response = await page.app.request('/studies/new');
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain('name="name"');
    expect(html).toContain('name="file"');
  });

  test('a name and a village CSV make a draft study, which says that it has no sources yet', async () => {
    const response = await newStudy(
      'Reef villages',
      new File([VILLAGES_CSV], 'villages.csv', { type: 'text/csv' }),
    );
    expect(response.status).toBe(303);
    const id = /^\/studies\/([^/]+)\/edit$/.exec(response.headers.get('Location') ?? '')?.[1];
    expect(id).toBeDefined();
    const editor = await (await page.app.request(`/studies/${id}/edit`)).text();
    expect(editor).toContain('data-community="test-cove"');
    expect(editor).toContain('data-community="far-reef"');
    expect(editor).toContain('data-missing="sources"');
    expect(editor).not.toContain('data-missing="communities"');
    const overview = await page.app.request(`/studies/${id}`);
    expect(overview.status).toBe(200);
    const text = await overview.text();
    expect(text).toContain('This study is not complete yet');
    expect(text).toContain('data-missing="sources"');
    // The API refuses to screen a draft, naming what is missing.
    const run = await page.app.request(`/api/studies/${id}/runs`, { method: 'POST' });
    expect(run.status).toBe(422);
    const body = (await run.json()) as { issues: { path: string }[] };
    expect(body.issues.map((i) => i.path)).toContain('sources.features');
  });

  test('an empty study (a name only) lacks both parts', async () => {
    const response = await newStudy('Blank page');
    expect(response.status).toBe(303);
    const editor = await (await page.app.request(response.headers.get('Location') ?? '')).text();
    expect(editor).toContain('data-missing="communities"');
    expect(editor).toContain('data-missing="sources"');
  });

  test('a blank name or a bad village file saves nothing and says which field', async () => {
    const before = count();
    const blank = await newStudy('   ');
    expect(blank.status).toBe(422);
    const blankHtml = await blank.text();
    expect(blankHtml).toMatch(/id="study-name-problems"[^>]*>.*expected a study name/s);
    const bad = await newStudy(
      'Bad file',
      new File(['Name,Latitude,Longitude,Vs30\nTest Cove,-95,-140.2,500\n'], 'villages.csv'),
    );
    expect(bad.status).toBe(422);
    const badHtml = await bad.text();
    expect(badHtml).toContain('id="communities-problems"');
    expect(badHtml).toContain('Line 2');
    expect(badHtml).toContain('value="Bad file"');
    expect(count()).toBe(before);
  });
});

describe('rename, copy and delete', () => {
  let id: string;
  beforeAll(() => {
    id = saveStudy(page.ctx.store, smallStudy('Original'));
  });

  test('a rename is written into the document; a blank one is refused', async () => {
    expect((await post(`/studies/${id}/rename`, { name: '' })).status).toBe(422);
    const response = await post(`/studies/${id}/rename`, { name: 'Renamed' });
    expect(response.status).toBe(303);
    const record = page.ctx.store.studies.get(id);
    expect(record?.name).toBe('Renamed');
    expect((JSON.parse(record?.document ?? '{}') as { name: string }).name).toBe('Renamed');
  });

  test('a copy gets the document under its own name, not the runs', async () => {
    const form = await (await page.app.request(`/studies/${id}/duplicate`)).text();
    expect(form).toContain('value="Renamed (copy)"');
    page.ctx.store.runs.create({
      studyId: id,
      document: page.ctx.store.studies.get(id)?.document ?? '',
      inputHash: 'x',
    });
    const response = await post(`/studies/${id}/duplicate`, { name: 'Second look' });
    expect(response.status).toBe(303);
    const copyId = response.headers.get('Location')?.split('/')[2] ?? '';
    const copy = page.ctx.store.studies.get(copyId);
    expect(copy?.name).toBe('Second look');
    const { name: _a, ...original } = JSON.parse(page.ctx.store.studies.get(id)?.document ?? '');
    const { name: _b, ...copied } = JSON.parse(copy?.document ?? '');
    expect(copied).toEqual(original);
    expect(page.ctx.store.runs.listForStudy(copyId)).toHaveLength(0);
  });

  test('the delete page counts what goes with the study; posting it deletes them', async () => {
    page.ctx.store.visits.add(id, {
      communityId: 'first',
      visitedOn: '2026-03-14',
      language: 'English',
      peopleReached: 40,
      topics: 'drop, cover, hold on',
      followUps: '',
      referral: 'requested',
    });
    const confirm = await page.app.request(`/studies/${id}/delete`);
    expect(confirm.status).toBe(200);
    const html = await confirm.text();
    expect(html).toMatch(/data-count="runs">[^<]*screenings: 1/);
    expect(html).toMatch(/data-count="maps">[^<]*hazard maps: 0/);
    expect(html).toMatch(/data-count="catalogs">[^<]*earthquake catalogs: 0/);
    expect(html).toMatch(/data-count="visits">[^<]*visit records: 1/);
    expect(page.ctx.store.studies.get(id)).toBeDefined();
    const response = await post(`/studies/${id}/delete`);
    expect(response.status).toBe(303);
    expect(page.ctx.store.studies.get(id)).toBeUndefined();
    expect(page.ctx.store.runs.listForStudy(id)).toHaveLength(0);
    expect(page.ctx.store.visits.count(id)).toBe(0);
    expect((await page.app.request(`/studies/${id}/delete`)).status).toBe(404);
  });
});
