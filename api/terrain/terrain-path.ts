import { basename, dirname, isAbsolute, resolve } from 'node:path';
import { InvalidInput } from '../engine/errors.ts';

/** A study file's `terrain`, read beside the study file (the CLI: any relative or absolute path). */
export const terrainBesideStudy = (studyPath: string, terrain: string): string =>
  isAbsolute(terrain) ? terrain : resolve(dirname(studyPath), terrain);

/**
 * A stored study's `terrain` in the service's terrain folder: a bare file name only, so a study
 * sent over HTTP can never make the service read a file outside that folder.
 */
export function terrainInFolder(folder: string, terrain: string): string {
  if (terrain !== basename(terrain) || terrain.startsWith('.') || terrain.includes('\\')) {
    throw new InvalidInput([
      {
        path: 'terrain',
        message: `the service reads terrain grids from its terrain folder only: expected a bare file name such as "coast.asc", got "${terrain}"`,
      },
    ]);
  }
  return resolve(folder, terrain);
}
