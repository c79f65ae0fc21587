import { randomBytes } from 'node:crypto';

/**
 * A new record id: 12 URL-safe characters (72 random bits), short enough to read in a URL and
 * far beyond any chance of collision among the studies and runs of one database.
 */
export function newId(): string {
  return randomBytes(9).toString('base64url');
}
