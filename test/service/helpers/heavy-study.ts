import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { REPO_ROOT, jsonInit, type ServiceProcess } from './service-process.ts';

/** Copies of each demo village: the demo alone screens in about a second, too quick to stay in flight. */
const COPIES = 40;

/**
 * The demo study with every village repeated `copies` times a little further north (0.01° a
 * copy): the demo's sources and models; with COPIES, minutes of work on one thread, well inside
 * the work budget. For tests and benchmarks that need a run still computing while they measure,
 * or a study with many communities.
 */
export function heavyStudy(copies: number = COPIES): Record<string, unknown> {
  const demo = JSON.parse(readFileSync(join(REPO_ROOT, 'data-demo/demo.study.json'), 'utf8')) as {
    communities: Record<string, any>[];
  } & Record<string, unknown>;
  const communities = demo.communities.flatMap((village) =>
    Array.from({ length: copies }, (_, k) => ({
      ...village,
      id: `${village.id}-${k + 1}`,
      name: `${village.name} ${k + 1}`,
      lat: village.lat + 0.01 * k,
    })),
  );
  return { ...demo, name: 'Heavy demo', communities };
}

/** Saves heavyStudy() in the service and returns its id. */
export async function saveHeavyStudy(service: ServiceProcess): Promise<string> {
  const response = await service.fetch('/api/studies', jsonInit('POST', heavyStudy()));
  if (response.status !== 201)
    throw new Error(`the heavy study was not saved: ${response.status} ${await response.text()}`);
  return ((await response.json()) as { id: string }).id;
}
