import type { Study } from '../engine/model.ts';

/**
 * Fewest communities for a screening to go to the queue: below this a screening takes seconds
 * on one machine, less than the round trips of handing it out would save (a judgement, not a
 * measurement of every cluster).
 */
export const QUEUED_SCREENING_COMMUNITIES = 50;

/**
 * Whether a screening's communities go to the queue of `tremora worker` machines when there is
 * one (TREMORA_QUEUE): the service's runs and `tremora screen` both ask here.
 */
export function isQueuedScreening(study: Study): boolean {
  return study.communities.length >= QUEUED_SCREENING_COMMUNITIES;
}
