import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import type { Translator } from '../../../web/text/translator.ts';

interface RunAnswer {
  readonly status: string;
  readonly error: string | null;
}

/**
 * From a screening run's page to the study's overview, as a reader with script gets there.
 * The run is followed through the API too, so a run that fails or stalls is reported with its
 * status and error rather than as a page that never moved on. A small run can be done before
 * its page is first shown; that page has no run to follow (otherwise the script moves on within
 * about a second of the end) and offers the results by a link, which is then taken.
 */
export async function followRunToOverview(
  page: Page,
  service: { fetch(path: string): Promise<Response> },
  studyUrl: string,
  tr: Translator,
  timeoutMs = 280_000,
): Promise<void> {
  await page.waitForURL(/\/runs\//);
  const runId = new URL(page.url()).pathname.split('/').at(-1) ?? '';
  const deadline = Date.now() + timeoutMs;
  let run: RunAnswer;
  for (;;) {
    run = (await (await service.fetch(`/api/runs/${runId}`)).json()) as RunAnswer;
    if ((run.status !== 'queued' && run.status !== 'running') || Date.now() > deadline) break;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  expect(run).toMatchObject({ status: 'done', error: null });
  const movedOn = await page.waitForURL(studyUrl, { timeout: 5_000 }).then(
    () => true,
    () => false,
  );
  if (movedOn) return;
  await page.getByRole('link', { name: tr.t('run.see') }).click();
  await page.waitForURL(studyUrl, { timeout: 30_000 });
}
