import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { ARTIFACTS, seriousAxeViolations } from './helpers/chromium.ts';
import { browserService, saveStudy, screenStudy } from './helpers/browser-service.ts';
import { cutDownDemo } from '../web/helpers/cut-down-demo.ts';
import { screenshotTwoWidths } from './helpers/browser-service.ts';

/**
 * Recording a visit and planning a trip in Chromium, on a cut-down demo (three villages, PGA
 * only) so the screening is quick; screenshots at desktop and 390 px phone widths go to
 * test-artifacts/.
 */
const rig = browserService({
  tempPrefix: 'tremora-visits-browser-',
  database: 'visits.db',
  prepare: async (service) => {
    const study = cutDownDemo(
      'Demo coast, visits',
      ['harbour-point', 'vennick-bay', 'lisk-head'],
      ['orle-interface'],
    );
    const id = await saveStudy(service, study);
    await screenStudy(service, id);
    return id;
  },
  setupTimeoutMs: 180_000,
});

/** At 1100 px and at 390 px; no sideways scrolling at 390 px is reported, not asserted. */
const shoot = (name: string): Promise<void> => screenshotTwoWidths(rig.page, name, 1100);

describe('visits in a browser', { timeout: 120_000 }, () => {
  test('a planner records a visit, plans a trip from the visit priority, then deletes the visit', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/communities/lisk-head`);
    await rig.page.getByRole('link', { name: 'Record a visit' }).click();
    await rig.page.getByLabel('Date of the visit').fill('2026-04-09');
    await rig.page.getByLabel('Language used').fill('English');
    await rig.page.getByLabel('People reached').fill('31');
    await rig.page.getByLabel('Topics').fill('What to do during shaking');
    await rig.page.getByLabel('Follow-ups').fill('Bring posters for the school');
    await rig.page
      .getByLabel('Referral for a professional assessment')
      .selectOption({ label: 'requested' });
    expect(await seriousAxeViolations(rig.page)).toEqual([]);
    await shoot('visit-form');
    await rig.page.getByRole('button', { name: 'Save the visit' }).click();
    const visits = rig.page.locator('.visit-records table');
    await expect.poll(() => visits.textContent()).toContain('Bring posters for the school');
    expect(await visits.textContent()).toContain('requested');

    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}#priority-heading`);
    const table = rig.page.locator('table.priority-table');
    expect(
      await table.locator('tr[data-community="lisk-head"] [data-key="visits"]').textContent(),
    ).toBe('1');
    await shoot('visit-priority');
    for (const name of ['Harbour Point', 'Vennick Bay', 'Lisk Head'])
      await rig.page.getByLabel(`Add ${name} to the trip`).check();
    await rig.page.getByLabel('Start from').selectOption({ label: 'Lisk Head' });
    await rig.page.getByLabel('Come back to the start').check();
    await rig.page.getByRole('button', { name: 'Plan a trip with the chosen villages' }).click();
    const stops = rig.page.locator('table.trip-table tbody tr[data-community]');
    expect(await stops.count()).toBe(3);
    expect(await stops.first().getAttribute('data-community')).toBe('lisk-head');
    expect(await rig.page.locator('.trip-total').textContent()).toMatch(/\d km$/);
    expect(await seriousAxeViolations(rig.page)).toEqual([]);
    await shoot('trip-plan');
    await rig.page.emulateMedia({ media: 'print' });
    expect(await rig.page.locator('.site-header').isVisible()).toBe(false);
    expect(await rig.page.locator('table.trip-table').isVisible()).toBe(true);
    await rig.page.screenshot({ path: join(ARTIFACTS, 'trip-plan-print.png'), fullPage: true });
    await rig.page.emulateMedia({ media: 'screen' });

    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/communities/lisk-head`);
    await rig.page.getByRole('link', { name: /^Delete the visit of / }).click();
    expect(await rig.page.locator('h1').textContent()).toMatch(
      /^Delete the visit to Lisk Head of /,
    );
    expect(await seriousAxeViolations(rig.page)).toEqual([]);
    await shoot('visit-delete');
    await rig.page.getByRole('button', { name: 'Delete this visit' }).click();
    await rig.page.waitForURL(/\/communities\/lisk-head(#visits-heading)?$/);
    expect(await rig.page.locator('.visit-records').textContent()).toContain(
      'No visit has been recorded here yet.',
    );
    expect(rig.foreignRequests).toEqual([]);
  });
});
