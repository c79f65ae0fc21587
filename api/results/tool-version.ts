import { readFileSync } from 'node:fs';

/** Tremora's version, from package.json: it goes into every run's provenance. */
export const TOOL_VERSION: string = (
  JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as {
    version: string;
  }
).version;
