import { vi } from 'vitest';
import type { Study } from '../../api/engine/model.ts';
import type { ScreenStudyOptions } from '../../api/engine/screen-study.ts';
import { referenceScreening } from '../helpers/reference-hazard/reference-screening.ts';

/*
 * Every check of screen-study.test.ts again, on the plain reference sum: the same test file,
 * with screenStudy replaced by the oracle of test/helpers/reference-hazard/. Progress and
 * cancellation belong to the engine's loop over communities, not to the sum, so the checks
 * that ask for them still run on the engine.
 */
vi.mock('../../api/engine/screen-study.ts', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../api/engine/screen-study.ts')>();
  const screenStudy = (study: Study, options: ScreenStudyOptions = {}) =>
    options.onProgress || options.shouldStop
      ? original.screenStudy(study, options)
      : referenceScreening(study, options);
  return { ...original, screenStudy };
});

await import('./screen-study.test.ts');
