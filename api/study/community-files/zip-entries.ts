import { unzipSync } from 'fflate';
import { CommunityFileProblem } from './file-problem.ts';

/**
 * Most bytes a zip (KMZ, zipped shapefile, XLSX) may unpack to: a village list or a fault
 * database is far smaller, and the cap keeps a small upload from unpacking to gigabytes.
 */
export const MAX_UNZIPPED_BYTES = 64 * 1024 * 1024;

/** The files of a zip by path, leaving out the folders a Mac adds; a damaged or oversized zip is a CommunityFileProblem. */
export function zipEntries(bytes: Uint8Array, fileName: string): Map<string, Uint8Array> {
  let total = 0;
  let entries: Record<string, Uint8Array>;
  try {
    entries = unzipSync(bytes, {
      filter: (file) => {
        total += file.originalSize;
        if (total > MAX_UNZIPPED_BYTES)
          throw new CommunityFileProblem(
            `${fileName}: expected a zip that unpacks to at most ${MAX_UNZIPPED_BYTES / 1024 / 1024} MiB (the limit), got more`,
          );
        return !file.name.startsWith('__MACOSX/') && !file.name.endsWith('/');
      },
    });
  } catch (error) {
    if (error instanceof CommunityFileProblem) throw error;
    throw new CommunityFileProblem(
      `${fileName}: expected a zip file, but it cannot be unpacked (${(error as Error).message})`,
    );
  }
  return new Map(Object.entries(entries));
}

/** The entries whose names end with `extension` (case-insensitive). */
export function entriesEnding(
  entries: ReadonlyMap<string, Uint8Array>,
  extension: string,
): string[] {
  return [...entries.keys()].filter((name) => name.toLowerCase().endsWith(extension));
}

/** "a.dbf, b.prj" or "nothing", for a message. */
export function listEntries(entries: ReadonlyMap<string, Uint8Array>): string {
  return entries.size === 0 ? 'nothing' : [...entries.keys()].slice(0, 20).join(', ');
}
