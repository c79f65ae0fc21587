import js from '@eslint/js';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import tseslint from 'typescript-eslint';

/**
 * A small rule set that catches what the compiler does not: import cycles between modules,
 * unused variables and imports, `any`, and a few mistakes of plain JavaScript. Layout and
 * spacing are prettier's (.prettierrc.json); nothing here overlaps with it.
 */
export default tseslint.config(
  { ignores: ['node_modules/', 'test-artifacts/', 'dist/', '.tremora/', 'api/bin/'] },
  {
    files: ['**/*.ts', '**/*.tsx', '**/*.js'],
    extends: [js.configs.recommended, ...tseslint.configs.recommended],
    plugins: { 'import-x': importX },
    languageOptions: { ecmaVersion: 2023, sourceType: 'module' },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js'] })],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/extensions': ['.ts', '.tsx', '.js'],
    },
    rules: {
      // Data flows one way between folders; a cycle is a layering mistake even where it runs.
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-self-import': 'error',
      // The folders' layering (DEVELOPERS.md, Layout): the engine is pure and stands alone; what
      // the service does never reaches back into HTTP or pages; pages never import a route.
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './api/engine', from: './api', except: ['./engine'] },
            { target: './api/engine', from: './web' },
            { target: './api/operations', from: ['./api/service', './web'] },
            { target: './api/*/**', from: './web', message: 'only api/server.ts mounts the pages' },
            { target: './web', from: './api/service/routes' },
          ],
        },
      ],
      '@typescript-eslint/no-unused-vars': [
        'error',
        {
          argsIgnorePattern: '^_',
          varsIgnorePattern: '^_',
          caughtErrors: 'none',
          ignoreRestSiblings: true,
        },
      ],
      '@typescript-eslint/no-explicit-any': 'error',
      // `== null` is the one loose comparison kept: it means null or undefined.
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      // Published coefficients keep every printed digit, even past a double's precision.
      'no-loss-of-precision': 'off',
    },
  },
  {
    // The engine is pure: no file, network or process access (its coefficient tables are JSON
    // modules, loaded by the module loader as its code is).
    files: ['api/engine/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: [
                'node:*',
                'fs',
                'fs/*',
                'path',
                'url',
                'os',
                'child_process',
                'worker_threads',
              ],
              message: 'the engine does no I/O',
            },
          ],
        },
      ],
    },
  },
  {
    // Tests read parsed JSON and child-process output of loose shape.
    files: ['test/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
);
