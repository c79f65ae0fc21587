import { randomBytes } from 'node:crypto';
import type { Database } from 'better-sqlite3';

/**
 * The accesses to the pages given to browsers (migration 005). An access is a row: giving one
 * adds it, leaving deletes it, and one past its expiry counts as gone. The browser's cookie
 * names the row (page-access.ts), so ending an access here ends it for whoever holds a copy
 * of the cookie, and a restart does not bring it back.
 */
export class PageAccessRepository {
  constructor(private readonly db: Database) {}

  /** Adds an access lasting until `expiresAt` and returns its id (32 random bytes, base64url). */
  open(now: Date, expiresAt: Date): string {
    const id = randomBytes(32).toString('base64url');
    this.db.transaction(() => {
      // Expired rows are dropped here, so the table holds at most the accesses still running.
      this.db.prepare('DELETE FROM page_access WHERE expires_at <= ?').run(now.toISOString());
      this.db
        .prepare('INSERT INTO page_access (id, created_at, expires_at) VALUES (?, ?, ?)')
        .run(id, now.toISOString(), expiresAt.toISOString());
    })();
    return id;
  }

  /** Whether the access `id` was given and has neither ended nor expired at `now`. */
  isOpen(id: string, now: Date): boolean {
    return (
      this.db
        .prepare('SELECT 1 AS one FROM page_access WHERE id = ? AND expires_at > ?')
        .get(id, now.toISOString()) !== undefined
    );
  }

  /** Ends the access `id`; ending one already gone changes nothing. */
  end(id: string): void {
    this.db.prepare('DELETE FROM page_access WHERE id = ?').run(id);
  }
}
