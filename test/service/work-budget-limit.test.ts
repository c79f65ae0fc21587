import { describe, expect, it } from 'vitest';
import { expectError } from './helpers/assertions.ts';
import { jsonInit, serviceForFile } from './helpers/service-process.ts';
import { smallStudy } from './helpers/small-study.ts';

/**
 * The work budget (api/operations/work-budget.ts) against a started service whose budget is set
 * below the small study's work (1 community x 3 levels x the M 6.5 point's 8 virtual ruptures
 * = 24).
 */
const service = serviceForFile('budget', { TREMORA_WORK_BUDGET: '2' });

const EXPECTED_ERROR =
  'study is too large: 1 community x 8 ruptures x 3 levels (over 1 measure) = 24, over the budget of 2';

describe('a study over the work budget', () => {
  it('is refused by validate and compute with 422 naming the size and the budget', async () => {
    for (const path of ['/api/validate', '/api/compute']) {
      const body = await expectError(
        await service.fetch(path, jsonInit('POST', smallStudy())),
        422,
      );
      expect(body.error).toBe(EXPECTED_ERROR);
      expect(body.size).toBe(24);
      expect(body.budget).toBe(2);
      expect(body.issues).toHaveLength(1);
      expect(body.issues[0]?.path).toBe('(study)');
    }
  });

  it('can be saved, but a run of it is refused with 422 and no run is recorded', async () => {
    const created = await service.fetch('/api/studies', jsonInit('POST', smallStudy()));
    expect(created.status).toBe(201);
    const { id } = (await created.json()) as { id: string };
    const body = await expectError(
      await service.fetch(`/api/studies/${id}/runs`, { method: 'POST' }),
      422,
    );
    expect(body.error).toBe(EXPECTED_ERROR);
    const { runs } = (await (await service.fetch(`/api/studies/${id}/runs`)).json()) as {
      runs: unknown[];
    };
    expect(runs).toEqual([]);
  });
});
