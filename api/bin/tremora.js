#!/usr/bin/env node
// The installed `tremora` command: runs the compiled CLI (dist/, built by `npm ci` or
// `npm run build`), so no TypeScript is loaded at start. From source: `npm run tremora:dev`.
import { existsSync } from 'node:fs';

const compiled = new URL('../../dist/api/cli.js', import.meta.url);
if (!existsSync(compiled)) {
  console.error(
    'tremora: the compiled CLI (dist/api/cli.js) is missing; run "npm run build" in the Tremora folder',
  );
  process.exit(1);
}
const { runCli } = await import(compiled.href);
process.exitCode = await runCli(process.argv.slice(2));
