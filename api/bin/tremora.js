#!/usr/bin/env node
// The installed `tremora` command: registers the TypeScript loader, then runs the CLI from source.
import { register } from 'tsx/esm/api';

register();
const { runCli } = await import('../cli.ts');
process.exitCode = await runCli(process.argv.slice(2));
