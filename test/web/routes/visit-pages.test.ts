import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { cutDownDemo } from '../helpers/cut-down-demo.ts';
import { saveAndScreen, startPageApp, type PageApp } from '../helpers/page-app.ts';

/**
 * Visit priority, trip plans and visit records through app.request(), on a cut-down demo
 * (three villages with details, PGA only) so a screening is quick. The scoring and the trip
 * order are checked by hand in test/results/visit-priority.test.ts and
 * test/engine/trip/visit-order.test.ts; these tests check the pages and the API carry them.
 */
let page: PageApp;
let id: string;
let runId: string;

beforeAll(async () => {
  page = startPageApp();
  const study = cutDownDemo(
    'Demo coast, visits',
    ['harbour-point', 'vennick-bay', 'lisk-head'],
    ['orle-interface'],
  );
  ({ id, runId } = await saveAndScreen(page, study));
}, 120_000);
afterAll(async () => page?.close());

const html = async (path: string, status = 200) => {
  const response = await page.app.request(path);
  expect(response.status).toBe(status);
  return response.text();
};
/** The community ids of a table's rows, in page order. */
const rowOrder = (text: string, table: string): string[] => {
  const start = text.indexOf(table);
  const body = text.slice(start, text.indexOf('</table>', start));
  return [...body.matchAll(/<tr data-community="([^"]+)"/g)].map((m) => m[1] as string);
};

describe('visit priority on the overview', () => {
  test('shows every component and follows the weights in the query', async () => {
    const text = await html(`/studies/${id}`);
    expect(text).toContain('id="priority-heading"');
    const components = ['people', 'chance', 'firmness', 'facilities', 'isolation'];
    for (const component of components) expect(text).toContain(`data-component="${component}"`);
    // One component weighted alone orders the villages by it.
    const alone = [
      // People: Vennick Bay (2,900) before Harbour Point (420) before Lisk Head (35).
      { component: 'people', order: ['vennick-bay', 'harbour-point', 'lisk-head'] },
      // Isolation: Lisk Head (61 km) first, Vennick Bay (3 km) last.
      { component: 'isolation', order: ['lisk-head', 'harbour-point', 'vennick-bay'] },
    ];
    for (const { component, order } of alone) {
      const weights = components.map((c) => `w-${c}=${c === component ? 1 : 0}`).join('&');
      expect(
        rowOrder(await html(`/studies/${id}?${weights}`), 'priority-table'),
        component,
      ).toEqual(order);
    }
  });

  test("shows the band's firmness from the run's band shares and ranks by it alone", async () => {
    const results = JSON.parse(page.ctx.store.runs.results(runId) as string) as {
      communities: {
        communityId: string;
        band: { id: string };
        bandRobustness: { bandShares: Record<string, number> };
      }[];
    };
    const firmness = new Map(
      results.communities.map((c) => [c.communityId, c.bandRobustness.bandShares[c.band.id]!]),
    );
    const text = await html(
      `/studies/${id}?w-people=0&w-chance=0&w-firmness=1&w-facilities=0&w-isolation=0`,
    );
    const expected = [...firmness.keys()].sort((a, b) => firmness.get(b)! - firmness.get(a)!);
    // Ties keep the ranking's input order, so compare the shares in page order, not the ids.
    expect(rowOrder(text, 'priority-table').map((c) => firmness.get(c))).toEqual(
      expected.map((c) => firmness.get(c)),
    );
    for (const [community, share] of firmness)
      expect(text).toMatch(
        new RegExp(
          `data-community="${community}"[\\s\\S]*?data-component="firmness"[^>]*>${Math.round(share * 100)}% of the weight`,
        ),
      );
    expect(text).toMatch(/name="w-firmness"[^>]*value="1"/);
  });

  test('names a weight that is not a number from 0 to 10 and keeps its default', async () => {
    const text = await html(`/studies/${id}?w-people=lots`);
    expect(text).toContain('w-people: expected a number from 0 to 10, got &quot;lots&quot;');
    expect(text).toMatch(/name="w-people"[^>]*value="3"/);
  });
});

describe('trip plan', () => {
  test('orders the chosen villages with legs that add up to the total', async () => {
    const text = await html(
      `/studies/${id}/trip?c=vennick-bay&c=lisk-head&c=harbour-point&start=harbour-point`,
    );
    const order = rowOrder(text, 'trip-table');
    expect(order[0]).toBe('harbour-point');
    expect(order).toHaveLength(3);
    expect(text).toContain('class="numeric trip-total"');
  });

  test('refuses an unknown village and an empty choice with a page that says so', async () => {
    expect(await html(`/studies/${id}/trip?c=nowhere`, 422)).toContain('nowhere');
    expect(await html(`/studies/${id}/trip`, 422)).toContain('Choose at least one village');
  });
});

describe('visit records', () => {
  test('a visit recorded on the page shows on the community page, the overview and the CSV', async () => {
    const posted = await page.app.request(`/studies/${id}/communities/lisk-head/visits`, {
      method: 'POST',
      body: new URLSearchParams({
        visitedOn: '2026-04-09',
        language: 'English',
        peopleReached: '31',
        topics: '=SUM(A1) drills',
        followUps: 'posters',
        referral: 'requested',
      }),
    });
    expect(posted.status).toBe(303);
    const community = await html(`/studies/${id}/communities/lisk-head`);
    expect(community).toContain('id="visits-heading"');
    expect(community).toContain('posters');
    const overview = await html(`/studies/${id}`);
    expect(overview).toMatch(/data-community="lisk-head"[\s\S]*?data-key="visits"[^>]*>1</);
    const csv = await (await page.app.request(`/api/studies/${id}/visits.csv`)).text();
    expect(csv.split('\r\n')[1]).toContain(',"\'=SUM(A1) drills",');
  });

  test('a form with problems is shown again with each problem beside its field', async () => {
    const posted = await page.app.request(`/studies/${id}/communities/lisk-head/visits`, {
      method: 'POST',
      body: new URLSearchParams({ visitedOn: '2026-02-30', language: '', peopleReached: 'many' }),
    });
    expect(posted.status).toBe(422);
    const text = await posted.text();
    expect(text).toContain('id="visit-visitedOn-problems"');
    expect(text).toContain('id="visit-language-problems"');
    expect(text).toContain('id="visit-peopleReached-problems"');
  });

  test('the API records, lists and deletes visits and answers bad input in the error shape', async () => {
    const body = {
      communityId: 'harbour-point',
      visitedOn: '2026-05-01',
      language: 'French',
      peopleReached: 12,
      referral: 'assessed',
    };
    const created = await page.app.request(`/api/studies/${id}/visits`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });
    expect(created.status).toBe(201);
    const visit = (await created.json()) as { id: string; referral: string };
    expect(visit.referral).toBe('assessed');
    const listed = (await (
      await page.app.request(`/api/studies/${id}/visits?community=harbour-point`)
    ).json()) as { count: number };
    expect(listed.count).toBe(1);
    const bad = await page.app.request(`/api/studies/${id}/visits`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ ...body, communityId: 'nowhere', peopleReached: -1 }),
    });
    expect(bad.status).toBe(422);
    const problem = (await bad.json()) as { error: string; issues: { path: string }[] };
    expect(problem.issues.map((i) => i.path)).toEqual(['peopleReached']);
    const unknown = await page.app.request(`/api/studies/${id}/visits`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ ...body, communityId: 'nowhere' }),
    });
    expect(((await unknown.json()) as { issues: { path: string }[] }).issues[0]?.path).toBe(
      'communityId',
    );
    const gone = await page.app.request(`/api/studies/${id}/visits/${visit.id}`, {
      method: 'DELETE',
    });
    expect(gone.status).toBe(204);
    expect(
      (await page.app.request(`/api/studies/${id}/visits/${visit.id}`, { method: 'DELETE' }))
        .status,
    ).toBe(404);
  });

  test('a visit is deleted from the pages after a confirmation, and the list follows', async () => {
    const created = await page.app.request(`/api/studies/${id}/visits`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({
        communityId: 'vennick-bay',
        visitedOn: '2026-06-02',
        language: 'English',
        peopleReached: 48,
        followUps: 'Second session at the harbour hall',
      }),
    });
    expect(created.status).toBe(201);
    const visit = (await created.json()) as { id: string };
    const path = `/studies/${id}/communities/vennick-bay/visits/${visit.id}/delete`;
    const before = await html(`/studies/${id}/communities/vennick-bay`);
    expect(before).toContain(`href="${path}"`);
    expect(before).toContain('Delete the visit of');
    const confirm = await html(path);
    expect(confirm).toContain('Second session at the harbour hall');
    expect(confirm).toMatch(new RegExp(`<form method="post" action="${path}"`));
    expect(page.ctx.store.visits.list(id, 'vennick-bay')).toHaveLength(1);
    const deleted = await page.app.request(path, { method: 'POST' });
    expect(deleted.status).toBe(303);
    expect(deleted.headers.get('location')).toBe(
      `/studies/${id}/communities/vennick-bay#visits-heading`,
    );
    expect(page.ctx.store.visits.list(id, 'vennick-bay')).toHaveLength(0);
    const after = await html(`/studies/${id}/communities/vennick-bay`);
    expect(after).not.toContain('Second session at the harbour hall');
    expect(after).toContain('No visit has been recorded here yet.');
    expect((await page.app.request(path, { method: 'POST' })).status).toBe(404);
    await html(path, 404);
    await html(`/studies/${id}/communities/lisk-head/visits/${visit.id}/delete`, 404);
  });
});
