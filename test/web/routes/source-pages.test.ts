import { describe, expect, test } from 'vitest';
import { pagesWithSmallStudy } from '../helpers/page-app.ts';

/**
 * One source at a time in the editor (app.request): a fault added from typed "lat, lon" lines
 * keeps the point source that was there; a bad dip is shown beside its field and nothing is
 * saved; an edit changes only its own source; a removal leaves the others.
 */
const pages = pagesWithSmallStudy('Source fixture');

const FAULT = {
  kind: 'fault',
  coordinates: '-47.3, -140.3\n-47.5, -140.1',
  order: 'auto',
  id: 'test-fault',
  name: 'Test Fault',
  setting: 'crustal',
  mechanism: 'reverse',
  dip: '45',
  lowerDepthKm: '15',
  'recurrence.type': 'gutenberg-richter',
  'recurrence.bValue': '1',
  'recurrence.mMin': '5',
  'recurrence.mMax': '7',
  'recurrence.rate': '0,02',
};

const post = (path: string, fields: Record<string, string>) =>
  pages.page.app.request(path, { method: 'POST', body: new URLSearchParams(fields) });
const features = () =>
  (
    JSON.parse(pages.page.ctx.store.studies.get(pages.studyId)?.document ?? '{}') as {
      sources: {
        features: { geometry: { coordinates: unknown }; properties: Record<string, unknown> }[];
      };
    }
  ).sources.features;

describe('single sources in the editor', () => {
  test('a bad dip is shown beside its field and nothing is saved', async () => {
    const before = pages.page.ctx.store.studies.get(pages.studyId)?.document;
    const response = await post(`/studies/${pages.studyId}/edit/new-source`, {
      ...FAULT,
      dip: '120',
    });
    expect(response.status).toBe(422);
    const html = await response.text();
    expect(html).toMatch(/id="source-dip-problem"[^>]*>.*expected a number in \(0, 90\]/s);
    expect(pages.page.ctx.store.studies.get(pages.studyId)?.document).toBe(before);
  });

  test('a fault from "lat, lon" lines is added beside the point source', async () => {
    const response = await post(`/studies/${pages.studyId}/edit/new-source`, FAULT);
    expect(response.status).toBe(303);
    const list = features();
    expect(list.map((f) => f.properties.id)).toEqual(['spot-below', 'test-fault']);
    expect(list[1]?.geometry.coordinates).toEqual([
      [-140.3, -47.3],
      [-140.1, -47.5],
    ]);
    expect(list[1]?.properties.recurrence).toEqual({
      type: 'gutenberg-richter',
      bValue: 1,
      mMin: 5,
      mMax: 7,
      rate: 0.02,
    });
    const editor = await (await pages.page.app.request(`/studies/${pages.studyId}/edit`)).text();
    expect(editor).toContain('data-source="test-fault"');
    expect(editor).toContain('<svg');
  });

  test('editing one source keeps the other; removing one leaves the other', async () => {
    const form = await (
      await pages.page.app.request(`/studies/${pages.studyId}/edit/sources/test-fault`)
    ).text();
    expect(form).toContain('-140.3 -47.3');
    const response = await post(`/studies/${pages.studyId}/edit/sources/test-fault`, {
      ...FAULT,
      coordinates: '-140.3 -47.3\n-140.1 -47.5',
      order: 'lon-lat',
      dip: '60',
    });
    expect(response.status).toBe(303);
    expect(features().map((f) => [f.properties.id, f.properties.dip])).toEqual([
      ['spot-below', undefined],
      ['test-fault', 60],
    ]);
    const removed = await post(`/studies/${pages.studyId}/edit/sources/spot-below/remove`, {});
    expect(removed.status).toBe(303);
    expect(features().map((f) => f.properties.id)).toEqual(['test-fault']);
  });
});
