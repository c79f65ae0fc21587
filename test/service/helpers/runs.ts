import { expect } from 'vitest';
import { INTERRUPTED_MESSAGE } from '../../../api/store/run-repository.ts';
import type { ServiceProcess } from './service-process.ts';
import { waitFor } from './service-process.ts';

export interface RunAnswer {
  id: string;
  studyId: string;
  status: 'queued' | 'running' | 'done' | 'failed' | 'cancelled' | 'interrupted';
  progress: number;
  inputHash: string;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  error: string | null;
  provenance: Record<string, unknown> | null;
  links: Record<string, string>;
}

export const FINISHED = ['done', 'failed', 'cancelled', 'interrupted'];

export async function getRun(service: ServiceProcess, id: string): Promise<RunAnswer> {
  return (await (await service.fetch(`/api/runs/${id}`)).json()) as RunAnswer;
}

/** Starts a run of a saved study (202) and returns its first state. */
export async function startRun(
  service: ServiceProcess,
  studyId: string,
  headers: Record<string, string> = {},
): Promise<RunAnswer> {
  const response = await service.fetch(`/api/studies/${studyId}/runs`, { method: 'POST', headers });
  const text = await response.text();
  expect(response.status, text).toBe(202);
  const run = JSON.parse(text) as RunAnswer;
  expect(response.headers.get('location')).toBe(`/api/runs/${run.id}`);
  return run;
}

/** Polls until the run reaches one of `statuses`. */
export async function waitForStatus(
  service: ServiceProcess,
  id: string,
  statuses: readonly string[] = FINISHED,
): Promise<RunAnswer> {
  return waitForAnswer(`run ${id}`, () => getRun(service, id), statuses);
}

/** Polls `get` until the answer (a run or a map, named by `what`) reaches one of `statuses`. */
export async function waitForAnswer<T extends { status: string }>(
  what: string,
  get: () => Promise<T>,
  statuses: readonly string[],
): Promise<T> {
  const answer = await waitFor(get, (a) => statuses.includes(a.status));
  expect(statuses, `${what} stayed ${answer.status}`).toContain(answer.status);
  return answer;
}

/** Checks a run or map answer that a stop or crash cut short: interrupted, saying so, no provenance. */
export function expectInterrupted(answer: unknown): void {
  expect(answer).toMatchObject({
    status: 'interrupted',
    error: INTERRUPTED_MESSAGE,
    provenance: null,
  });
}

/** The id of the demo study saved on first start. */
export async function demoStudyId(service: ServiceProcess): Promise<string> {
  const { studies } = (await (await service.fetch('/api/studies')).json()) as {
    studies: { id: string; name: string }[];
  };
  const demo = studies.find((s) => s.name === 'Demo coast');
  expect(demo, 'the demo study is saved on first start').toBeDefined();
  return (demo as { id: string }).id;
}
