import { createHash } from 'node:crypto';
import { deserialize, serialize } from 'node:v8';
import type { Redis } from 'ioredis';
import { inputKey, KEEP_S } from './queue-names.ts';

/**
 * A run's inputs travel to the workers through Redis, by content hash, never by shared disk:
 * the bytes are V8's structured serialisation (every number exactly as it was, −0 included),
 * stored once under the SHA-256 of those bytes.
 */
export async function putInput(redis: Redis, value: unknown): Promise<string> {
  const bytes = serialize(value);
  const hash = createHash('sha256').update(bytes).digest('hex');
  await redis.set(inputKey(hash), bytes, 'EX', KEEP_S);
  return hash;
}

export class MissingInput extends Error {
  override name = 'MissingInput';
}

/** The inputs stored under `hash`, checked against it. */
export async function getInput<T>(redis: Redis, hash: string): Promise<T> {
  const bytes = await redis.getBuffer(inputKey(hash));
  if (bytes === null)
    throw new MissingInput(
      `the inputs ${hash} are no longer in the queue's Redis (kept ${KEEP_S / 86_400} days); start the run again`,
    );
  const actual = createHash('sha256').update(bytes).digest('hex');
  if (actual !== hash)
    throw new MissingInput(
      `the inputs stored as ${hash} hash to ${actual}; expected them unchanged`,
    );
  return deserialize(bytes) as T;
}
