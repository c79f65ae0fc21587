import { z } from 'zod';
import { InvalidInput } from '../engine/errors.ts';
import type { Study } from '../engine/model.ts';
import { REFERRAL_STATUSES, type VisitWrite } from '../store/visit-repository.ts';
import { fromZod } from '../study/issues.ts';

/** Most people one visit can say it reached: a session, not a census (a typo guard). */
const MAX_PEOPLE_REACHED = 100_000;

const isCalendarDay = (text: string): boolean => {
  const date = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === text;
};

/** A visit as the API takes it (JSON) and the page form sends it (after its fields are read). */
const visitSchema = z.strictObject({
  communityId: z.string().min(1, 'expected the id of one of the study’s communities'),
  visitedOn: z
    .string()
    .refine(isCalendarDay, { message: 'expected a day as YYYY-MM-DD, for example 2026-03-14' }),
  language: z
    .string()
    .trim()
    .min(1, 'expected the language the session was held in')
    .max(80, 'expected at most 80 characters'),
  peopleReached: z
    .number({ message: 'expected a whole number of people, 0 or more' })
    .int('expected a whole number of people, 0 or more')
    .min(0, 'expected a whole number of people, 0 or more')
    .max(MAX_PEOPLE_REACHED, `expected at most ${MAX_PEOPLE_REACHED} people`),
  topics: z.string().trim().max(2000, 'expected at most 2000 characters').default(''),
  followUps: z.string().trim().max(2000, 'expected at most 2000 characters').default(''),
  referral: z
    .enum(REFERRAL_STATUSES, { message: `expected one of ${REFERRAL_STATUSES.join(', ')}` })
    .default('none'),
});

/**
 * A visit checked against the schema and the study (its community must be one of the
 * study's). Throws InvalidInput listing every problem with its field.
 */
export function readVisit(value: unknown, study: Study): VisitWrite {
  const parsed = visitSchema.safeParse(value, { reportInput: true });
  if (!parsed.success) throw new InvalidInput(fromZod(parsed.error), 'the visit has problems');
  if (!study.communities.some((c) => c.id === parsed.data.communityId))
    throw new InvalidInput(
      [
        {
          path: 'communityId',
          message: `expected the id of one of the study’s communities, got "${parsed.data.communityId.slice(0, 80)}"`,
        },
      ],
      'the visit has problems',
    );
  return parsed.data;
}
