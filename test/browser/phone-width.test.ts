import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { translator } from '../../web/text/translator.ts';
import { startRun, waitForStatus } from '../service/helpers/runs.ts';
import { jsonInit } from '../service/helpers/service-process.ts';
import { ARTIFACTS } from './helpers/chromium.ts';
import { browserService, saveStudy } from './helpers/browser-service.ts';
import { cutDownDemo } from '../web/helpers/cut-down-demo.ts';

/**
 * Every page at a phone's width (390 px): none may scroll sideways, that is the document may be
 * no wider than the window. The study is the demo cut down so that it screens quickly (four
 * villages, one of them on the coast, the interface alone, PGA only), with the demo
 * catalog attached, a visit recorded and a map run started. Screenshots of every page at 390 px
 * and 1280 px go to test-artifacts/phone-*.png.
 */
let runId: string;
let mapId: string;
let visitId: string;
const en = translator('en');

const PHONE_PX = 390;
const DESKTOP_PX = 1280;
const COMMUNITIES = ['harbour-point', 'vennick-bay', 'lisk-head', 'quillan-landing'];

const rig = browserService({
  tempPrefix: 'tremora-phone-',
  database: 'phone.db',
  prepare: async (service) => {
    const id = await saveStudy(
      service,
      cutDownDemo('Demo coast, phone', COMMUNITIES, ['orle-interface']),
    );
    const catalog = await service.fetch(`/api/studies/${id}/catalog`, {
      method: 'PUT',
      headers: { 'Content-Type': 'text/csv' },
      body: readFileSync(new URL('../../data-demo/catalog.csv', import.meta.url), 'utf8'),
    });
    expect(catalog.status, await catalog.clone().text()).toBe(201);
    const visit = await service.fetch(
      `/api/studies/${id}/visits`,
      jsonInit('POST', {
        communityId: 'lisk-head',
        visitedOn: '2026-04-09',
        language: 'English',
        peopleReached: 31,
        topics: 'What to do during shaking, and where to meet afterwards',
        followUps: 'Bring posters for the school and the health post',
        referral: 'requested',
      }),
    );
    expect(visit.status, await visit.clone().text()).toBe(201);
    visitId = ((await visit.json()) as { id: string }).id;
    const run = await startRun(service, id);
    runId = run.id;
    expect((await waitForStatus(service, run.id)).status).toBe('done');
    const map = await service.fetch(
      `/api/studies/${id}/maps`,
      jsonInit('POST', { measure: 'PGA', returnPeriodYears: 475, spacingKm: 40 }),
    );
    expect(map.status, await map.clone().text()).toBe(202);
    mapId = ((await map.json()) as { id: string }).id;
    return id;
  },
  context: {
    viewport: { width: PHONE_PX, height: 844 },
    // A phone's scrollbars float over the page, so the whole 390 px is the page's.
    isMobile: true,
    hasTouch: true,
  },
  setupTimeoutMs: 300_000,
});

/** The pages, by name: every GET route of web/pages.tsx and web/routes/, with the demo's ids. */
const pages = (): readonly (readonly [string, string])[] => [
  ['home', '/'],
  ['limits', '/limits'],
  ['access', '/access'],
  ['not-found', '/no-such-page'],
  ['study-create', '/studies/new'],
  ['overview', `/studies/${rig.studyId}`],
  ['run', `/studies/${rig.studyId}/runs/${runId}`],
  ['community', `/studies/${rig.studyId}/communities/lisk-head`],
  ['coastal-community', `/studies/${rig.studyId}/communities/quillan-landing`],
  ['handout', `/studies/${rig.studyId}/communities/quillan-landing/handout`],
  ['poster', `/studies/${rig.studyId}/communities/quillan-landing/poster`],
  ['visit-form', `/studies/${rig.studyId}/communities/lisk-head/visits/new`],
  ['visit-delete', `/studies/${rig.studyId}/communities/lisk-head/visits/${visitId}/delete`],
  [
    'trip-plan',
    `/studies/${rig.studyId}/trip?${COMMUNITIES.map((c) => `c=${c}`).join('&')}&return=1`,
  ],
  ['scenario-form', `/studies/${rig.studyId}/scenario?sourceId=orle-interface`],
  ['map', `/studies/${rig.studyId}/maps/${mapId}`],
  ['catalog', `/studies/${rig.studyId}/catalog`],
  ['editor', `/studies/${rig.studyId}/edit`],
  ['community-editor', `/studies/${rig.studyId}/edit/communities/lisk-head`],
  ['new-community', `/studies/${rig.studyId}/edit/new-community`],
  ['source-editor', `/studies/${rig.studyId}/edit/sources/orle-interface`],
  ['new-source', `/studies/${rig.studyId}/edit/new-source`],
  ['fault-import', `/studies/${rig.studyId}/edit/import-faults`],
  ['ground-motion', `/studies/${rig.studyId}/edit/ground-motion`],
  ['languages', '/languages'],
  ['study-rename', `/studies/${rig.studyId}/rename`],
  ['study-copy', `/studies/${rig.studyId}/duplicate`],
  ['study-delete', `/studies/${rig.studyId}/delete`],
];

/** The elements that reach past the window's right edge, deepest first, for the failure message. */
const WIDE_ELEMENTS = `(() => {
  const width = document.documentElement.clientWidth;
  return [...document.querySelectorAll('body *')]
    .filter((el) => el.getBoundingClientRect().right > width + 1 && ![...el.children].some((c) => c.getBoundingClientRect().right > width + 1))
    .slice(0, 5)
    .map((el) => el.tagName.toLowerCase() + (el.id ? '#' + el.id : '') + (el.className && typeof el.className === 'string' ? '.' + el.className.trim().split(/\\s+/).join('.') : '') + ' ' + Math.round(el.getBoundingClientRect().right) + 'px');
})()`;

async function checkWidth(name: string): Promise<void> {
  await rig.page.screenshot({ path: join(ARTIFACTS, `phone-${name}-390.png`), fullPage: true });
  const [scrollWidth, clientWidth] = (await rig.page.evaluate(
    '[document.documentElement.scrollWidth, document.documentElement.clientWidth]',
  )) as [number, number];
  const wide =
    scrollWidth > clientWidth ? ((await rig.page.evaluate(WIDE_ELEMENTS)) as string[]) : [];
  await rig.page.setViewportSize({ width: DESKTOP_PX, height: 900 });
  await rig.page.screenshot({ path: join(ARTIFACTS, `phone-${name}-1280.png`), fullPage: true });
  await rig.page.setViewportSize({ width: PHONE_PX, height: 844 });
  expect(
    scrollWidth,
    `${name}: the page is ${scrollWidth} px wide at ${PHONE_PX} px (${wide.join('; ')})`,
  ).toBeLessThanOrEqual(PHONE_PX);
  expect(scrollWidth, `${name}: wider than the window's ${clientWidth} px`).toBeLessThanOrEqual(
    clientWidth,
  );
}

describe('every page at a phone width', { timeout: 300_000 }, () => {
  test.each(pages().map(([name]) => name))('%s scrolls no sideways at 390 px', async (name) => {
    const path = pages().find(([n]) => n === name)![1];
    await rig.page.goto(`${rig.service.url}${path}`);
    await checkWidth(name);
  });

  test('the scenario result scrolls no sideways at 390 px', async () => {
    await rig.page.goto(
      `${rig.service.url}/studies/${rig.studyId}/scenario?sourceId=orle-interface`,
    );
    await rig.page.getByRole('button', { name: en.t('scenario.run') }).click();
    await rig.page.waitForSelector('.scenario-table', { timeout: 240_000 });
    await checkWidth('scenario');
  });
});
