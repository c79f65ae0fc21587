import { describe, expect, test } from 'vitest';
import { LEVELS_G } from '../../service/helpers/small-study.ts';
import { pagesWithSmallStudy } from '../helpers/page-app.ts';

/**
 * The ground-motion branches and settings in the editor (app.request): a saved change writes
 * only what the form changed; weights that do not add up to 1, a model the engine does not
 * offer, a setting that does not exist and a bad setting value are each shown beside their
 * field (or at the top, naming it) with status 422, and nothing is written.
 */
const pages = pagesWithSmallStudy('Motion fixture');

const post = (fields: Record<string, string>) =>
  pages.page.app.request(`/studies/${pages.studyId}/edit/ground-motion`, {
    method: 'POST',
    body: new URLSearchParams(fields),
  });
const stored = () =>
  JSON.parse(pages.page.ctx.store.studies.get(pages.studyId)?.document ?? '{}') as Record<
    string,
    unknown
  >;

/** The form as the page posts it for the fixture: its one crustal branch and its settings. */
const AS_SHOWN = {
  'branch.crustal.0.model': 'Cornell79',
  'branch.crustal.0.weight': '1',
  'settings.measures': 'PGA',
  'settings.returnPeriodsYears': '475',
  'settings.horizonsYears': '50',
  'settings.truncationSigma': '3',
};

describe('the ground-motion page', () => {
  test('lists the branches by setting and offers the models of each setting', async () => {
    const response = await pages.page.app.request(`/studies/${pages.studyId}/edit/ground-motion`);
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toMatch(/<tr data-model="Cornell79">/);
    expect(html).toMatch(/name="branch\.crustal\.0\.weight"[^>]*value="1"/);
    // Crustal models only for the crustal setting; interface shows the catalog's defaults.
    const crustalAdd = /id="add-crustal-model"[^>]*>(.*?)<\/select>/s.exec(html)?.[1] ?? '';
    expect(crustalAdd).toContain('<option value="BSSA14">');
    expect(crustalAdd).not.toContain('AGA16');
    expect(html).toMatch(/name="branch\.interface\.1\.model" value="AGA16"/);
    expect(html).toMatch(/id="setting-returnPeriodsYears"[^>]*value="475"/);
    const editor = await (await pages.page.app.request(`/studies/${pages.studyId}/edit`)).text();
    expect(editor).toContain(`href="/studies/${pages.studyId}/edit/ground-motion"`);
  });

  test('weights that do not add up to 1 are shown with their setting and nothing is saved', async () => {
    const before = pages.page.ctx.store.studies.get(pages.studyId)?.document;
    const response = await post({ ...AS_SHOWN, 'branch.crustal.0.weight': '0,6' });
    expect(response.status).toBe(422);
    const html = await response.text();
    expect(html).toMatch(
      /id="branch-crustal-sum-problem"[^>]*>.*expected weights summing to 1 \(within 0\.000001\), got 0\.6/s,
    );
    expect(html).toMatch(/name="branch\.crustal\.0\.weight"[^>]*value="0,6"/);
    const notNumber = await post({ ...AS_SHOWN, 'branch.crustal.0.weight': 'half' });
    expect(notNumber.status).toBe(422);
    expect(await notNumber.text()).toMatch(
      /id="branch-crustal-0-weight-problem"[^>]*>.*expected a number in \(0, 1\], got &quot;half&quot;/s,
    );
    expect(pages.page.ctx.store.studies.get(pages.studyId)?.document).toBe(before);
  });

  test('a model the engine does not offer is named beside its row', async () => {
    const before = pages.page.ctx.store.studies.get(pages.studyId)?.document;
    const response = await post({ ...AS_SHOWN, 'branch.crustal.0.model': 'NoSuchModel' });
    expect(response.status).toBe(422);
    expect(await response.text()).toMatch(
      /id="branch-crustal-0-model-problem"[^>]*>.*unknown model &quot;NoSuchModel&quot;; expected one of BSSA14/s,
    );
    expect(pages.page.ctx.store.studies.get(pages.studyId)?.document).toBe(before);
  });

  test('a tectonic setting that does not exist is refused, naming it', async () => {
    const before = pages.page.ctx.store.studies.get(pages.studyId)?.document;
    const response = await post({
      ...AS_SHOWN,
      'branch.volcanic.0.model': 'Cornell79',
      'branch.volcanic.0.weight': '1',
    });
    expect(response.status).toBe(422);
    expect(await response.text()).toMatch(
      /id="form-problems".*groundMotion\.volcanic: unknown tectonic setting &quot;volcanic&quot;; expected one of crustal, interface, intraslab/s,
    );
    expect(pages.page.ctx.store.studies.get(pages.studyId)?.document).toBe(before);
  });

  test('a setting out of range is shown beside its field', async () => {
    const response = await post({ ...AS_SHOWN, 'settings.zoneCellKm': '0.5' });
    expect(response.status).toBe(422);
    expect(await response.text()).toMatch(
      /id="setting-zoneCellKm-problem"[^>]*>.*expected a number in \[1, 100\] km, got 0\.5/s,
    );
  });

  test('a valid change is saved: a model added, weights changed, settings, levels kept', async () => {
    const response = await post({
      ...AS_SHOWN,
      'branch.crustal.0.weight': '0,7',
      'add.crustal.model': 'BSSA14',
      'add.crustal.weight': '0.3',
      'branch.intraslab.0.model': 'AGA16',
      'branch.intraslab.0.weight': '0.6',
      'branch.intraslab.1.model': 'Zhao06',
      'branch.intraslab.1.weight': '0.4',
      'settings.returnPeriodsYears': '975, 475',
      'settings.zoneCellKm': '5',
    });
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe(
      `/studies/${pages.studyId}/edit?saved=1#motion-heading`,
    );
    const doc = stored();
    // The intraslab rows posted are the catalog's defaults, which the study had left implicit.
    expect(doc.groundMotion).toEqual({
      crustal: [
        { model: 'Cornell79', weight: 0.7 },
        { model: 'BSSA14', weight: 0.3 },
      ],
    });
    expect(doc.settings).toEqual({
      levels: { PGA: LEVELS_G },
      measures: ['PGA'],
      returnPeriodsYears: [975, 475],
      horizonsYears: [50],
      truncationSigma: 3,
      zoneCellKm: 5,
    });
    const removed = await post({
      ...AS_SHOWN,
      'branch.crustal.0.remove': 'true',
      'branch.crustal.1.model': 'BSSA14',
      'branch.crustal.1.weight': '1',
    });
    expect(removed.status).toBe(303);
    expect((stored().groundMotion as Record<string, unknown>).crustal).toEqual([
      { model: 'BSSA14', weight: 1 },
    ]);
  });
});
