import { beforeEach, describe, expect, it } from 'vitest';
import { openStore } from '../../api/store/store.ts';
import { type StudyRepository } from '../../api/store/study-repository.ts';
import { type VisitRepository, type VisitWrite } from '../../api/store/visit-repository.ts';

let studies: StudyRepository;
let visits: VisitRepository;

beforeEach(() => {
  ({ studies, visits } = openStore(':memory:'));
});

const visit = (overrides: Partial<VisitWrite> = {}): VisitWrite => ({
  communityId: 'upper-cove',
  visitedOn: '2026-03-14',
  language: 'English',
  peopleReached: 42,
  topics: 'drop, cover, hold on',
  followUps: 'send posters',
  referral: 'requested',
  ...overrides,
});

describe('VisitRepository', () => {
  it('keeps visits per study, newest visit first, and lists one community', () => {
    const id = studies.create({ name: 'A', document: '{}' }).id;
    visits.add(id, visit({ visitedOn: '2026-01-02' }));
    visits.add(id, visit({ visitedOn: '2026-05-30', communityId: 'low-point' }));
    expect(visits.list(id).map((v) => v.visitedOn)).toEqual(['2026-05-30', '2026-01-02']);
    expect(visits.list(id, 'upper-cove')).toHaveLength(1);
    expect(visits.list(id, 'upper-cove')[0]).toMatchObject(visit({ visitedOn: '2026-01-02' }));
    expect(visits.count(id)).toBe(2);
  });

  it('refuses a visit to a study that does not exist', () => {
    expect(visits.add('missing', visit())).toBeUndefined();
  });

  it('deletes one visit, and every visit of a deleted study', () => {
    const id = studies.create({ name: 'A', document: '{}' }).id;
    const other = studies.create({ name: 'B', document: '{}' }).id;
    const first = visits.add(id, visit());
    visits.add(id, visit());
    visits.add(other, visit());
    expect(visits.delete(other, first?.id ?? '')).toBe(false);
    expect(visits.delete(id, first?.id ?? '')).toBe(true);
    expect(visits.count(id)).toBe(1);
    studies.delete(id);
    expect(visits.count(id)).toBe(0);
    expect(visits.count(other)).toBe(1);
  });

  it('refuses a malformed day or an unknown referral status in the table itself', () => {
    const id = studies.create({ name: 'A', document: '{}' }).id;
    expect(() => visits.add(id, visit({ visitedOn: '14/03/2026' }))).toThrow(/CHECK/);
    expect(() => visits.add(id, visit({ referral: 'maybe' as 'none' }))).toThrow(/CHECK/);
  });
});
