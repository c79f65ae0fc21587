import { describe, expect, it } from 'vitest';
import { MAX_RUPTURE_PLANES } from '../../../api/study/rupture-estimate.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';
import { describeLoad, loadMix, startHeavyRun } from './load-mix.ts';

/**
 * Load, the short burst: a fixed number of requests (autocannon on loopback) to
 * health, the study overview page and a small compute while a heavy run computes. Asserted:
 * every request answered and none failed (errors, timeouts, non-2xx answers), whatever the
 * machine's speed; requests per second and latencies are printed, not asserted (the measured
 * run is test/bench/load.bench.ts). Then the quick thread beside a hostile study: the hostile
 * one refused, the small one answered, the time printed.
 */

const AMOUNTS = { health: 200, page: 24, compute: 4 } as const;
const CONNECTIONS = 8;

// Two run workers: one for the heavy run, one for the computes beside it.
const service = serviceForFile('load', { TREMORA_WORKERS: '2' });

/** A study whose fault trace zig-zags through `vertices` vertices 0.01 degrees apart, ruptures up to M 8. */
function zigZagStudy(vertices: number): Record<string, unknown> {
  const study = smallStudy('Zig-zag') as {
    sources: { features: Record<string, unknown>[] };
    groundMotion: unknown;
    settings: Record<string, unknown>;
  };
  study.sources.features = [
    {
      type: 'Feature',
      geometry: {
        type: 'LineString',
        coordinates: Array.from({ length: vertices }, (_, i) => [
          -140.5 + i * 0.01,
          -47.5 + (i % 2) * 0.01,
        ]),
      },
      properties: {
        id: 'zig-zag',
        setting: 'crustal',
        mechanism: 'strike-slip',
        dip: 90,
        upperDepthKm: 0,
        lowerDepthKm: 15,
        recurrence: { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 8, aValue: 3.1 },
      },
    },
  ];
  return study;
}

describe('under load while a heavy run computes', () => {
  it(
    'health, the overview page and a small compute answer every request, none failed',
    { timeout: 900_000 },
    async () => {
      const { runId, studyId } = await startHeavyRun(service);
      const started = Date.now();
      const targets = await loadMix(service, studyId, runId, {
        amounts: AMOUNTS,
        connections: CONNECTIONS,
      });
      const run = (await (await service.fetch(`/api/runs/${runId}`)).json()) as { status: string };
      console.log(
        `load burst, ${AMOUNTS.health} + ${AMOUNTS.page} + ${AMOUNTS.compute} requests on ${CONNECTIONS} connections (compute ${CONNECTIONS / 4}) in ${((Date.now() - started) / 1000).toFixed(1)} s, heavy run ${run.status} at the end:\n  ${describeLoad(targets)}`,
      );
      for (const { label, result } of targets) {
        expect({
          label,
          errors: result.errors,
          timeouts: result.timeouts,
          non2xx: result.non2xx,
        }).toEqual({ label, errors: 0, timeouts: 0, non2xx: 0 });
      }
      expect(targets.map((t) => t.result.requests.total)).toEqual([
        AMOUNTS.health,
        AMOUNTS.page,
        AMOUNTS.compute,
      ]);
      await service.fetch(`/api/runs/${runId}/cancel`, { method: 'POST' });
    },
  );

  it(
    'a hostile study (a fault of 5,000 zig-zag vertices) is refused while a small one beside it is validated',
    { timeout: 300_000 },
    async () => {
      const hostile = JSON.stringify(zigZagStudy(5000));
      const small = JSON.stringify(smallStudy('Beside the hostile one'));
      // Warm the quick thread so the figure is of the service, not of loading its code.
      expect((await service.fetch('/api/validate', jsonInit('POST', small))).status).toBe(200);
      const refusals = Array.from({ length: 3 }, () =>
        service.fetch('/api/validate', jsonInit('POST', hostile)),
      );
      const started = performance.now();
      const answer = await service.fetch('/api/validate', jsonInit('POST', small));
      const smallMs = performance.now() - started;
      expect(answer.status).toBe(200);
      for (const refused of await Promise.all(refusals)) {
        expect(refused.status).toBe(422);
        expect(
          ((await refused.json()) as { issues: { message: string }[] }).issues[0]?.message,
        ).toContain(`over the limit of ${MAX_RUPTURE_PLANES}`);
      }
      console.log(
        `quick thread beside 3 hostile studies (${(hostile.length / 1024).toFixed(0)} KB each, refused): the small study validated in ${smallMs.toFixed(0)} ms`,
      );
    },
  );
});
