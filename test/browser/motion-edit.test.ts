import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { translator } from '../../web/text/translator.ts';
import { smallStudy } from '../service/helpers/small-study.ts';
import { startService, tempDir, type ServiceProcess } from '../service/helpers/service-process.ts';
import {
  ARTIFACTS,
  launchChromium,
  offlineContext,
  seriousAxeViolations,
  walkWithTab,
  type LaunchedBrowser,
} from './helpers/chromium.ts';
import { followRunToOverview } from './helpers/run-page.ts';

/**
 * The ground-motion page in Chromium: from the editor's link, a weight that leaves the crustal
 * weights short of 1 is refused beside its setting (nothing saved); a model added with the
 * remaining weight and a return period added are saved; the study is screened again and its
 * overview shows the new return period. Screenshots at 1280 and 390 px.
 */
const dir = tempDir('tremora-motion-');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let context: BrowserContext;
let page: Page;
let studyId: string;
const en = translator('en');

const document = async () =>
  JSON.parse(await (await service.fetch(`/api/studies/${studyId}/document`)).text()) as {
    groundMotion: Record<string, unknown>;
    settings: Record<string, unknown>;
  };

beforeAll(async () => {
  service = await startService({ databasePath: join(dir.path, 'motion.db') });
  const created = await service.fetch('/api/studies', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(smallStudy('Motion villages')),
  });
  expect(created.status).toBe(201);
  studyId = ((await created.json()) as { id: string }).id;
  chromium = await launchChromium();
  ({ context } = await offlineContext(chromium.browser, service.url, {
    javaScriptEnabled: true,
    viewport: { width: 1280, height: 900 },
  }));
  page = await context.newPage();
});

afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await service?.stop();
  dir.remove();
});

describe('ground motion and settings from the pages', { timeout: 300_000 }, () => {
  test('a weight and a return period edited, then the study screened again', async () => {
    await page.goto(`${service.url}/studies/${studyId}/edit`);
    await page.getByRole('link', { name: en.t('motion.link') }).click();
    await page.waitForURL(/\/edit\/ground-motion$/);

    await page.fill('#branch-crustal-0-weight', '0.6');
    await page.getByRole('button', { name: en.t('motion.save') }).click();
    await page.waitForSelector('#branch-crustal-sum-problem');
    expect(await page.locator('#branch-crustal-sum-problem').textContent()).toBe(
      'expected weights summing to 1 (within 0.000001), got 0.6',
    );
    expect(await page.locator('#branch-crustal-sum').textContent()).toBe(
      'The weights add up to 0.6.',
    );
    expect(await page.getByRole('alert').first().textContent()).toBe(en.t('editor.notSaved'));
    expect((await document()).groundMotion).toEqual({
      crustal: [{ model: 'Cornell79', weight: 1 }],
    });
    await page.screenshot({ path: join(ARTIFACTS, 'motion-problem.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: join(ARTIFACTS, 'motion-problem-390.png'), fullPage: true });
    await page.setViewportSize({ width: 1280, height: 900 });
    const violations = await seriousAxeViolations(page);
    expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
    expect((await walkWithTab(page)).missed).toEqual([]);

    await page.selectOption('#add-crustal-model', 'BSSA14');
    await page.fill('#add-crustal-weight', '0.4');
    await page.fill('#setting-returnPeriodsYears', '475, 975');
    await page.getByRole('button', { name: en.t('motion.save') }).click();
    await page.waitForURL(/\/edit\?saved=1#motion-heading$/);
    expect(await page.getByRole('status').textContent()).toBe(en.t('editor.saved'));
    const saved = await document();
    expect(saved.groundMotion).toEqual({
      crustal: [
        { model: 'Cornell79', weight: 0.6 },
        { model: 'BSSA14', weight: 0.4 },
      ],
    });
    expect(saved.settings.returnPeriodsYears).toEqual([475, 975]);

    await page.goto(`${service.url}/studies/${studyId}/edit/ground-motion`);
    // The two crustal rows saved, and the catalog's defaults for the settings the study leaves out.
    const { interface: subduction, intraslab } = modelCatalog.defaultBranches;
    expect(await page.locator('tr[data-model]').count()).toBe(
      2 + subduction.length + intraslab.length,
    );
    await page.screenshot({ path: join(ARTIFACTS, 'motion-saved.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: join(ARTIFACTS, 'motion-saved-390.png'), fullPage: true });
    await page.setViewportSize({ width: 1280, height: 900 });

    const studyUrl = `${service.url}/studies/${studyId}`;
    await page.goto(studyUrl);
    await page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await followRunToOverview(page, service, studyUrl, en);
    expect(await page.locator('tr[data-community] [data-band]').count()).toBe(1);
    // The new return period is offered for the hazard map of the study screened again.
    expect(await page.locator('option', { hasText: '(return period 975 years)' }).count()).toBe(1);
    await page.screenshot({ path: join(ARTIFACTS, 'motion-screened.png'), fullPage: true });
  });
});
