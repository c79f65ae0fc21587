import { describe, expect, it } from 'vitest';
import { expectRelative } from '../../helpers/close.ts';
import { expectError } from '../helpers/assertions.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import { CORNELL79, DEPTH_KM, MAGNITUDE, MEDIAN_PGA_G } from '../helpers/small-study.ts';

const service = serviceForFile('probe');

describe('POST /api/probe', () => {
  it('evaluates one model at a stated geometry', async () => {
    const response = await service.fetch(
      '/api/probe',
      jsonInit('POST', {
        model: 'Cornell79',
        magnitude: MAGNITUDE,
        rjbKm: 0,
        rhypoKm: DEPTH_KM,
        measures: ['PGA'],
      }),
    );
    expect(response.status).toBe(200);
    const body = (await response.json()) as {
      model: string;
      measures: Record<string, { median: number; sigma: number; unit: string }>;
    };
    expect(body.model).toBe('Cornell79');
    expectRelative(
      body.measures.PGA!.median,
      MEDIAN_PGA_G,
      1e-12,
      'Cornell et al. (1979) median PGA, M 6.5, R 10 km',
    );
    expect(body.measures.PGA!.sigma).toBe(CORNELL79.sigma);
    expect(body.measures.PGA!.unit).toBe('g');
  });

  it('422 naming the fields: unknown model, bad magnitude, unknown key', async () => {
    const body = await expectError(
      await service.fetch(
        '/api/probe',
        jsonInit('POST', { model: 'NOPE', magnitude: 'big', rjbKm: 5, colour: 1 }),
      ),
      422,
    );
    expect(body.issues.map((i) => i.path).sort()).toEqual(['colour', 'magnitude', 'model']);
    expect(body.issues.find((i) => i.path === 'magnitude')?.message).toBe(
      'expected a number in [1, 10] (moment magnitude), got "big"',
    );
  });

  it('422 for a measure the model does not have', async () => {
    const body = await expectError(
      await service.fetch(
        '/api/probe',
        jsonInit('POST', { model: 'Cornell79', magnitude: 6, rjbKm: 5, measures: ['SA(1.0)'] }),
      ),
      422,
    );
    expect(body.error).toBe(
      'unsupported measure "SA(1)": Cornell79 (Cornell et al. 1979) predicts PGA only',
    );
  });
});
