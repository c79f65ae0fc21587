import { vi } from 'vitest';
import type { ScreenStudyOptions } from '../../api/engine/screen-study.ts';
import type { Study } from '../../api/engine/model.ts';

/*
 * Every check of screen-study.test.ts again, on the reference path: the same test file, with
 * screenStudy's default path switched to 'reference' (the fast path is the default there).
 */
vi.mock('../../api/engine/screen-study.ts', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../api/engine/screen-study.ts')>();
  return { ...original, screenStudy: (study: Study, options: ScreenStudyOptions = {}) => original.screenStudy(study, { path: 'reference', ...options }) };
});

await import('./screen-study.test.ts');
