import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { openStore } from '../../api/store/store.ts';

const dirs: string[] = [];
const dbPath = () => {
  const dir = mkdtempSync(join(tmpdir(), 'tremora-access-'));
  dirs.push(dir);
  return join(dir, 'tremora.db');
};
afterEach(() => dirs.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true })));

const NOW = new Date('2026-06-01T08:00:00Z');
const later = (hours: number) => new Date(NOW.getTime() + hours * 3_600_000);

describe('page accesses', () => {
  it('an ended access stays ended after the database is opened again; one still open stays open', () => {
    const path = dbPath();
    const first = openStore(path);
    const ended = first.pageAccess.open(NOW, later(24));
    const kept = first.pageAccess.open(NOW, later(24));
    expect(first.pageAccess.isOpen(ended, NOW)).toBe(true);
    first.pageAccess.end(ended);
    expect(first.pageAccess.isOpen(ended, NOW)).toBe(false);
    first.close();

    const reopened = openStore(path);
    expect(reopened.pageAccess.isOpen(ended, later(1))).toBe(false);
    expect(reopened.pageAccess.isOpen(kept, later(1))).toBe(true);
    reopened.close();
  });

  it('an access counts as gone from its expiry on, and expired rows are dropped when one is given', () => {
    const store = openStore(dbPath());
    const id = store.pageAccess.open(NOW, later(2));
    expect(store.pageAccess.isOpen(id, later(1))).toBe(true);
    expect(store.pageAccess.isOpen(id, later(2))).toBe(false);
    store.pageAccess.open(later(3), later(5));
    const count = store.db.prepare('SELECT COUNT(*) AS n FROM page_access').get() as { n: number };
    expect(count.n).toBe(1);
    expect(store.pageAccess.isOpen('never-given', NOW)).toBe(false);
    store.close();
  });
});
