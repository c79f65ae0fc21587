import { z } from 'zod';
import type { ChunkQueue } from './chunk-queue.ts';

/**
 * The setting that turns on the queue: TREMORA_QUEUE, the URL of a Redis server (redis:// or
 * rediss:// for TLS), in the environment of the CLI, the service and every `tremora worker`.
 * Unset or empty: everything runs in process, on the pool's own threads.
 */
export const QUEUE_SETTING = 'TREMORA_QUEUE';

const queueUrl = z
  .string()
  .trim()
  .refine((text) => URL.canParse(text) && ['redis:', 'rediss:'].includes(new URL(text).protocol), {
    message: `${QUEUE_SETTING}: expected a Redis URL such as redis://127.0.0.1:6379`,
  });

export class QueueSettingError extends Error {
  override name = 'QueueSettingError';
}

/** The queue's Redis URL from the environment; undefined when the setting is absent. */
export function queueUrlFrom(
  env: Readonly<Record<string, string | undefined>>,
): string | undefined {
  const raw = env[QUEUE_SETTING];
  if (raw === undefined || raw.trim() === '') return undefined;
  const parsed = queueUrl.safeParse(raw);
  if (!parsed.success)
    throw new QueueSettingError(`${parsed.error.issues[0]?.message ?? 'invalid'}; got "${raw}"`);
  return parsed.data;
}

/**
 * Opens the chunk queue at `url`, loading BullMQ only then: it takes about 0.3 s to load, and
 * a command run without the setting never needs it.
 */
export async function openChunkQueue(url: string): Promise<ChunkQueue> {
  const { ChunkQueue } = await import('./chunk-queue.ts');
  return ChunkQueue.open({ url });
}
