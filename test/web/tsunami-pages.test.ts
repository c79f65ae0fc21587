import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { TsunamiResult } from '../../api/engine/tsunami/index.ts';
import { DEMO_STUDY_URL } from '../../api/operations/demo-seed.ts';
import { saveAndScreen, startPageApp, type PageApp } from './helpers/page-app.ts';

/**
 * The tsunami time to act on the pages, through app.request(): a cut-down demo (its interface
 * source, two coastal villages and one inland, PGA only) over the demo terrain grid, so a
 * screening is quick. The numbers on the pages are the API's (the engine's checks are in
 * test/engine/tsunami/).
 */
let page: PageApp;
let id: string;

function cutDemo(): { readonly name: string } & Record<string, unknown> {
  const demo = JSON.parse(readFileSync(DEMO_STUDY_URL, 'utf8')) as Record<string, any>;
  return {
    ...demo,
    name: 'Demo coast, tsunami pages',
    communities: demo.communities.filter((c: { id: string }) =>
      ['harbour-point', 'quillan-landing', 'pellow'].includes(c.id),
    ),
    sources: {
      type: 'FeatureCollection',
      features: demo.sources.features.filter(
        (f: { properties: { id: string } }) => f.properties.id === 'orle-interface',
      ),
    },
    settings: {
      ...demo.settings,
      measures: ['PGA'],
      magnitudeStep: 0.5,
      horizonsYears: [50],
      returnPeriodsYears: [475],
    },
  };
}

beforeAll(async () => {
  page = startPageApp();
  ({ id } = await saveAndScreen(page, cutDemo()));
}, 120_000);
afterAll(async () => page?.close());

const html = async (path: string, init?: RequestInit) => {
  const response = await page.app.request(path, init);
  expect(response.status).toBe(200);
  return response.text();
};
const api = async () =>
  (await (await page.app.request(`/api/studies/${id}/tsunami`)).json()) as TsunamiResult;

describe('tsunami time to act on the pages', () => {
  test('the community page of a coastal village says the time in plain words, the high ground and the caution', async () => {
    const times = (await api()).communities.find((c) => c.id === 'harbour-point');
    if (!times || times.firstArrivalMinutes === null || times.highGround?.kind !== 'found')
      throw new Error('no time for harbour-point');
    const text = await html(`/studies/${id}/communities/harbour-point`);
    expect(text).toContain(`data-first-arrival-minutes="${times.firstArrivalMinutes}"`);
    expect(text).toMatch(
      new RegExp(
        `After strong or long shaking, go at once to high ground\\. A tsunami from the plate boundary could reach this coast in about ${times.firstArrivalMinutes} to ${times.latestMinutes} minutes\\.`,
      ),
    );
    expect(text).toMatch(
      /The nearest high ground is about [\d.]+ km to the (north|south|east|west|north-east|north-west|south-east|south-west)\./,
    );
    expect(text).toMatch(/rough screening estimate, not a warning/);
    expect(text).toMatch(/undersea landslide can come sooner/);
  });

  test('the handout carries the same sentence; an inland village has none', async () => {
    expect(await html(`/studies/${id}/communities/quillan-landing/handout`)).toMatch(
      /could reach this coast in about \d+ to \d+ minutes/,
    );
    expect(await html(`/studies/${id}/communities/pellow`)).not.toContain('tsunami-time');
  });

  test('the overview ranks the coastal villages by time to act, soonest first', async () => {
    const text = await html(`/studies/${id}`);
    const ranking = text.slice(text.indexOf('id="tsunami-ranking"'));
    const order = [
      ...ranking.matchAll(/<tr data-community="([^"]+)" data-first-arrival-minutes="(\d*)"/g),
    ].map((m) => [m[1], Number(m[2])] as const);
    expect(order.map(([c]) => c).sort()).toEqual(['harbour-point', 'quillan-landing']);
    expect(order[0]![1]).toBeLessThanOrEqual(order[1]![1]);
  });

  test('the scenario page gives the times for the chosen rupture on the interface', async () => {
    const text = await html(`/studies/${id}/scenario`, {
      method: 'POST',
      body: new URLSearchParams({ sourceId: 'orle-interface', magnitude: '8.5' }),
    });
    expect(text).toContain('Tsunami from this earthquake');
    expect(text).toMatch(/<tr data-community="harbour-point" data-first-arrival-minutes="\d+"/);
    expect(text).toMatch(/not a warning/);
  });
});
