import { describe, expect, it } from 'vitest';
import type { StudyResult } from '../../../api/engine/results.ts';
import { expectRelative } from '../../helpers/close.ts';
import { DEFAULT_WORK_BUDGET } from '../../../api/operations/work-budget.ts';
import { expectError, expectSecurityHeaders } from '../helpers/assertions.ts';
import { startRun, waitForStatus } from '../helpers/runs.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import { EXCEEDANCE_AT_LEVELS, RATE_PER_YEAR, smallStudy } from '../helpers/small-study.ts';
import { VIRTUAL_STRIKE_COUNT } from '../../../api/engine/ruptures/virtual-ruptures.ts';

const service = serviceForFile('compute');

describe('POST /api/validate', () => {
  it('says a valid study is valid, with its size, the budget and its input hash', async () => {
    const response = await service.fetch('/api/validate', jsonInit('POST', smallStudy()));
    expect(response.status).toBe(200);
    const body = (await response.json()) as Record<string, unknown>;
    expect(body).toMatchObject({
      valid: true,
      name: 'Small test study',
      communities: 1,
      sources: 1,
      measures: ['PGA'],
      warnings: [],
    });
    // The M 6.5 point is one virtual rupture per strike (ruptures/virtual-ruptures.ts), each
    // computed at the 3 levels.
    expect(body.work).toMatchObject({
      size: 3 * VIRTUAL_STRIKE_COUNT,
      ruptures: VIRTUAL_STRIKE_COUNT,
      budget: DEFAULT_WORK_BUDGET,
    });
    expect(body.inputHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('lists every problem of an invalid study (422) and saves nothing', async () => {
    const before = ((await (await service.fetch('/api/studies')).json()) as { studies: unknown[] })
      .studies.length;
    const bad = smallStudy();
    bad.groundMotion = { crustal: [{ model: 'NO-SUCH-MODEL', weight: 1 }] };
    (bad.settings as Record<string, unknown>).horizonsYears = [0];
    const body = await expectError(
      await service.fetch('/api/validate', jsonInit('POST', bad)),
      422,
    );
    expect(body.issues.map((i) => i.path).sort()).toEqual([
      'groundMotion.crustal[0].model',
      'settings.horizonsYears[0]',
    ]);
    const after = ((await (await service.fetch('/api/studies')).json()) as { studies: unknown[] })
      .studies.length;
    expect(after).toBe(before);
  });
});

describe('POST /api/compute', () => {
  it('screens a posted study without saving it, with the same numbers as a saved run', async () => {
    const response = await service.fetch('/api/compute', jsonInit('POST', smallStudy()));
    expect(response.status).toBe(200);
    expectSecurityHeaders(response);
    const result = (await response.json()) as StudyResult;
    expect(result.provenance.tool).toBe('tremora');
    const rates = result.communities[0]!.curves.PGA!.annualRate;
    EXCEEDANCE_AT_LEVELS.forEach((p, i) =>
      expectRelative(
        rates[i] as number,
        RATE_PER_YEAR * p,
        1e-6,
        `Cornell et al. (1979) median, truncated normal at +-3 sigma (Abramowitz & Stegun 1964 Table 26.1), level ${i}`,
      ),
    );
    const created = await service.fetch('/api/studies', jsonInit('POST', smallStudy()));
    const { id } = (await created.json()) as { id: string };
    const run = await waitForStatus(service, (await startRun(service, id)).id);
    const saved = (await (
      await service.fetch(`/api/runs/${run.id}/results`)
    ).json()) as StudyResult;
    expect(saved.communities).toEqual(result.communities);
    expect(saved.provenance.inputHash).toBe(result.provenance.inputHash);
  });

  it('422 for an invalid study, 400 for malformed JSON, 415 for another type', async () => {
    const bad = smallStudy();
    bad.communities = [];
    const body = await expectError(await service.fetch('/api/compute', jsonInit('POST', bad)), 422);
    expect(body.issues.map((i) => i.path)).toEqual(['communities']);
    await expectError(await service.fetch('/api/compute', jsonInit('POST', '{')), 400);
    await expectError(
      await service.fetch('/api/compute', {
        method: 'POST',
        headers: { 'Content-Type': 'text/csv' },
        body: 'a,b',
      }),
      415,
    );
  });
});
