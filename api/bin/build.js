// `npm run build` (also run by `npm ci` through `prepare`): compiles api/ and web/ to plain
// JavaScript in dist/, one file per source file in the same tree, so the CLI, the service and
// the worker threads start without a TypeScript loader. esbuild only strips types (the
// type-check is `npm run typecheck`). Files the code reads beside itself (package.json for the
// version, the demo data, the SQL migrations, the page styles and script, the text bundles) are
// copied so that every relative path stays the same as in the source tree. The ground-motion
// models' coefficient tables (JSON imported by their modules) are inlined into those modules:
// esbuild would otherwise drop the import attribute Node needs to load JSON.
import { cpSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
// `--out DIR` builds elsewhere (the tests build a copy of their own); it must lie inside the
// project so that the compiled modules find node_modules.
const outAt = process.argv.indexOf('--out');
const OUT =
  outAt > 0 && process.argv[outAt + 1] ? resolve(process.argv[outAt + 1]) : join(ROOT, 'dist');

function sourceFiles(dir) {
  return readdirSync(join(ROOT, dir), { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(entry.name) && !entry.name.endsWith('.d.ts') ? [path] : [];
  });
}

// Each file stays its own module: relative imports are left to the compiled neighbour (".ts"
// becomes ".js"), packages are left to node_modules; JSON data is inlined.
const keepModulesApart = {
  name: 'keep-modules-apart',
  setup(b) {
    b.onResolve({ filter: /^\.\.?\// }, (args) =>
      args.kind === 'entry-point' || args.path.endsWith('.json')
        ? undefined
        : { path: args.path.replace(/\.tsx?$/, '.js'), external: true },
    );
  },
};

const started = performance.now();
rmSync(OUT, { recursive: true, force: true });
const entryPoints = [...sourceFiles('api'), ...sourceFiles('web')];
await build({
  absWorkingDir: ROOT,
  entryPoints,
  outdir: OUT,
  outbase: '.',
  bundle: true,
  packages: 'external',
  plugins: [keepModulesApart],
  platform: 'node',
  format: 'esm',
  target: 'node20',
  tsconfig: join(ROOT, 'tsconfig.json'),
  logLevel: 'warning',
});
const pkg = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8'));
writeFileSync(
  join(OUT, 'package.json'),
  `${JSON.stringify({ name: pkg.name, version: pkg.version, private: true, type: 'module' }, null, 2)}\n`,
);
for (const dir of ['data-demo', 'api/store/migrations', 'web/static', 'web/text/bundles'])
  cpSync(join(ROOT, dir), join(OUT, dir), {
    recursive: true,
    filter: (src) => !src.endsWith('.ts'),
  });
console.log(
  `built ${entryPoints.length} modules into ${relative(process.cwd(), OUT) || '.'}/ in ${Math.round(performance.now() - started)} ms`,
);
