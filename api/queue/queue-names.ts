import { Redis } from 'ioredis';

/**
 * Names shared by the coordinating process and the workers. Keys live under one prefix, so a
 * Redis server can serve other programs too.
 */
export const QUEUE_PREFIX = 'tremora';
export const CHUNK_QUEUE = 'chunks';

/** A run's inputs, by the SHA-256 of their bytes (job-inputs.ts). */
export const inputKey = (hash: string): string => `${QUEUE_PREFIX}:input:${hash}`;
/** Set when a run is cancelled: workers skip its chunks and stop the one they hold. */
export const cancelKey = (planKey: string): string => `${QUEUE_PREFIX}:cancel:${planKey}`;

/** How long inputs and cancel marks stay in Redis, seconds: longer than any run. */
export const KEEP_S = 7 * 24 * 3600;

/** A connection as BullMQ needs it: commands wait for a reconnection rather than fail. */
export const connect = (url: string): Redis => new Redis(url, { maxRetriesPerRequest: null });

/** What a chunk job carries: the task without its inputs, which travel by content hash. */
export type ChunkJobData =
  | {
      readonly kind: 'map-points';
      readonly inputHash: string;
      readonly planKey: string;
      readonly map: unknown;
      readonly firstIndex: number;
      readonly count: number;
    }
  | {
      readonly kind: 'screen-communities';
      readonly inputHash: string;
      readonly planKey: string;
      readonly indices: readonly number[];
    };
