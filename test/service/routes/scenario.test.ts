import { describe, expect, it } from 'vitest';
import type { ScenarioResult } from '../../../api/engine/scenario/index.ts';
import { expectRelative } from '../../helpers/close.ts';
import { expectError } from '../helpers/assertions.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import {
  CORNELL79,
  DEPTH_KM,
  MAGNITUDE,
  MEDIAN_PGA_G,
  smallStudy,
} from '../helpers/small-study.ts';

const service = serviceForFile('scenario');

describe('scenario', () => {
  const request = { sourceId: 'spot-below', magnitude: MAGNITUDE };

  it('POST /api/scenario gives the median of the model at the community', async () => {
    const response = await service.fetch(
      '/api/scenario',
      jsonInit('POST', { study: smallStudy(), ...request }),
    );
    expect(response.status).toBe(200);
    const scenario = (await response.json()) as ScenarioResult;
    expect(scenario).toMatchObject({
      sourceId: 'spot-below',
      magnitude: MAGNITUDE,
      models: [{ model: 'Cornell79', weight: 1 }],
    });
    const community = scenario.communities[0]!;
    expect(community.rjbKm).toBe(0);
    const pga = community.motions.PGA!;
    // Straight below at 10 km: R = 10 km in Cornell et al. (1979) (as quoted by Baker 2008).
    expectRelative(
      pga.median,
      MEDIAN_PGA_G,
      1e-9,
      `Cornell et al. (1979) median PGA, M ${MAGNITUDE}, R ${DEPTH_KM} km`,
    );
    expectRelative(
      pga.p84,
      MEDIAN_PGA_G * Math.exp(CORNELL79.sigma),
      1e-9,
      'median x exp(sigma), sigma 0.57 (Cornell et al. 1979)',
    );
  });

  it('POST /api/studies/:id/scenario works on a saved study', async () => {
    const created = await service.fetch('/api/studies', jsonInit('POST', smallStudy()));
    const { id } = (await created.json()) as { id: string };
    const response = await service.fetch(`/api/studies/${id}/scenario`, jsonInit('POST', request));
    expect(response.status).toBe(200);
    const scenario = (await response.json()) as ScenarioResult;
    expectRelative(
      scenario.communities[0]!.motions.PGA!.median,
      MEDIAN_PGA_G,
      1e-9,
      'Cornell et al. (1979) median PGA',
    );
    await expectError(
      await service.fetch('/api/studies/none-such/scenario', jsonInit('POST', request)),
      404,
    );
  });

  it('lists every problem of the study and the request together (422)', async () => {
    const bad = smallStudy();
    bad.name = '';
    const body = await expectError(
      await service.fetch(
        '/api/scenario',
        jsonInit('POST', { study: bad, magnitude: 12, gridSpacing: 2 }),
      ),
      422,
    );
    expect(body.issues.map((i) => i.path).sort()).toEqual([
      'gridSpacing',
      'magnitude',
      'sourceId',
      'study.name',
    ]);
  });

  it('422 for a source the study does not have', async () => {
    const body = await expectError(
      await service.fetch(
        '/api/scenario',
        jsonInit('POST', { study: smallStudy(), sourceId: 'elsewhere', magnitude: 6 }),
      ),
      422,
    );
    expect(body.issues).toEqual([
      { path: 'sourceId', message: 'unknown source "elsewhere"; expected one of spot-below' },
    ]);
  });
});
