import type { Database } from 'better-sqlite3';
import { newId } from './new-id.ts';

/** Where a referral for a professional assessment stands after a visit. */
export const REFERRAL_STATUSES = ['none', 'requested', 'assessed', 'closed'] as const;
export type ReferralStatus = (typeof REFERRAL_STATUSES)[number];

/** One awareness visit to a community, as written (migration 005). */
export interface VisitWrite {
  readonly communityId: string;
  /** The day of the visit, YYYY-MM-DD. */
  readonly visitedOn: string;
  /** The language the session was held in. */
  readonly language: string;
  readonly peopleReached: number;
  readonly topics: string;
  readonly followUps: string;
  readonly referral: ReferralStatus;
}

export interface VisitRecord extends VisitWrite {
  readonly id: string;
  readonly studyId: string;
  /** ISO 8601 UTC. */
  readonly recordedAt: string;
}

interface VisitRow {
  id: string;
  study_id: string;
  community_id: string;
  visited_on: string;
  language: string;
  people_reached: number;
  topics: string;
  follow_ups: string;
  referral: ReferralStatus;
  recorded_at: string;
}

const recordOf = (row: VisitRow): VisitRecord => ({
  id: row.id,
  studyId: row.study_id,
  communityId: row.community_id,
  visitedOn: row.visited_on,
  language: row.language,
  peopleReached: row.people_reached,
  topics: row.topics,
  followUps: row.follow_ups,
  referral: row.referral,
  recordedAt: row.recorded_at,
});

const COLUMNS =
  'id, study_id, community_id, visited_on, language, people_reached, topics, follow_ups, referral, recorded_at';

/** The visits of every study; deleting a study deletes its visits (ON DELETE CASCADE). */
export class VisitRepository {
  readonly #db: Database;

  constructor(db: Database) {
    this.#db = db;
  }

  /** Records a visit; undefined when there is no such study. */
  add(studyId: string, write: VisitWrite): VisitRecord | undefined {
    const db = this.#db;
    return db.transaction(() => {
      if (db.prepare('SELECT 1 FROM studies WHERE id = ?').get(studyId) === undefined)
        return undefined;
      const record: VisitRecord = {
        ...write,
        id: newId(),
        studyId,
        recordedAt: new Date().toISOString(),
      };
      db.prepare(
        `INSERT INTO community_visits (${COLUMNS}) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
      ).run(
        record.id,
        studyId,
        record.communityId,
        record.visitedOn,
        record.language,
        record.peopleReached,
        record.topics,
        record.followUps,
        record.referral,
        record.recordedAt,
      );
      return record;
    })();
  }

  /** A study's visits, newest visit first; only one community's when `communityId` is given. */
  list(studyId: string, communityId?: string): VisitRecord[] {
    const rows = (
      communityId === undefined
        ? this.#db
            .prepare(
              `SELECT ${COLUMNS} FROM community_visits WHERE study_id = ? ORDER BY visited_on DESC, recorded_at DESC`,
            )
            .all(studyId)
        : this.#db
            .prepare(
              `SELECT ${COLUMNS} FROM community_visits WHERE study_id = ? AND community_id = ? ORDER BY visited_on DESC, recorded_at DESC`,
            )
            .all(studyId, communityId)
    ) as VisitRow[];
    return rows.map(recordOf);
  }

  /** How many visits a study has recorded: what deleting the study would delete with it. */
  count(studyId: string): number {
    return (
      this.#db
        .prepare('SELECT COUNT(*) AS n FROM community_visits WHERE study_id = ?')
        .get(studyId) as { n: number }
    ).n;
  }

  /** Deletes one visit of a study; false when there was none with that id. */
  delete(studyId: string, visitId: string): boolean {
    return (
      this.#db
        .prepare('DELETE FROM community_visits WHERE study_id = ? AND id = ?')
        .run(studyId, visitId).changes > 0
    );
  }
}
