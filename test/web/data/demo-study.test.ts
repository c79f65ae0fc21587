import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DEMO_STUDY_NAME, isDemoStudy } from '../../../web/data/demo-study.ts';

describe('the demo study', () => {
  it('is named as data-demo/demo.study.json names it', () => {
    const demo = JSON.parse(
      readFileSync(new URL('../../../data-demo/demo.study.json', import.meta.url), 'utf8'),
    ) as { name: string };
    expect(DEMO_STUDY_NAME).toBe(demo.name);
    expect(isDemoStudy(demo)).toBe(true);
    expect(isDemoStudy({ name: 'Our own coast' })).toBe(false);
    expect(isDemoStudy(undefined)).toBe(false);
  });
});
