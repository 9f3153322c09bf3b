import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import importX, { createNodeResolver } from 'eslint-plugin-import-x';
import globals from 'globals';

/**
 * The rooms of the house (DEVELOPERS.md, "Map of the house"): a client feature imports only from
 * src/lib, src/components, src/hooks, src/config, shared and its own folder; what two features share
 * lives in src/lib or src/components, and the routes in src/app compose features.
 */
const features = readdirSync(new URL('./src/features/', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

const featureZones = features.map((name) => ({
  target: `./src/features/${name}`,
  from: './src/features',
  except: [`./${name}`],
  message: `src/features/${name} may not reach into another feature; move what they share to src/lib or src/components, or compose them in a route (src/app/routes)`,
}));

const sharedZones = [
  {
    target: ['./src/components', './src/lib', './src/hooks', './src/config'],
    from: ['./src/features', './src/app'],
    message: 'shared client code imports no feature and no route',
  },
  {
    target: './src/features',
    from: './src/app',
    message: 'a feature never imports the app shell or a route',
  },
];

/** What shared/ (the engine and the schemas) must not touch: it runs in the browser, the server and the CLI. */
const ioGlobals = [
  'fetch',
  'process',
  'localStorage',
  'sessionStorage',
  'indexedDB',
  'XMLHttpRequest',
  'WebSocket',
  'caches',
  'document',
  'window',
  'navigator',
].map((name) => ({ name, message: 'shared/ does no I/O and reads no environment: pass what it needs in' }));

/** The code linted with type information: the server and shared/ (engine, schemas, study). */
const typedFiles = ['server/**/*.ts', 'shared/**/*.ts'];

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'data', 'coverage', 'tests/output', 'server/cli/bin.js'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  { files: ['*.js'], languageOptions: { globals: globals.node } },
  {
    files: ['**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-console': 'off',
    },
  },
  // Type-aware rules for the server and the engine (the client keeps the syntactic set: it is the
  // largest part of the tree and the slowest to type-check, and its payload types come from shared/).
  ...tseslint.configs.recommendedTypeChecked.map((config) => ({ ...config, files: typedFiles })),
  {
    files: typedFiles,
    languageOptions: { parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname } },
  },
  {
    files: ['src/**/*.{ts,tsx}', 'server/**/*.ts', 'shared/**/*.ts'],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/extensions': ['.ts', '.tsx', '.js'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.json'] })],
    },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/server/**', '../server/*'], message: 'src/ never imports server/' }] },
      ],
      'import-x/no-restricted-paths': ['error', { zones: [...featureZones, ...sharedZones] }],
    },
  },
  {
    files: ['server/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/src/**'], message: 'server/ never imports src/' }] },
      ],
    },
  },
  {
    files: ['server/**/*.router.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/src/**'], message: 'server/ never imports src/' },
            {
              group: ['**/*.repository'],
              message: 'a router calls services; only services use repositories',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: ['react', 'react-dom', 'knex', 'express', 'better-sqlite3', 'pg', 'nodemailer'].map(
            (name) => ({
              name,
              message: 'shared/ is pure TypeScript: no UI library, database, server or mail package',
            }),
          ),
          patterns: [
            { group: ['**/src/**', '**/server/**'], message: 'shared/ imports nothing from src/ or server/' },
            {
              group: [
                'node:*',
                'fs',
                'fs/*',
                'path',
                'http',
                'https',
                'net',
                'child_process',
                'os',
                'worker_threads',
              ],
              message: 'shared/ does no I/O',
            },
            { group: ['react/*', 'react-dom/*', 'knex/*'], message: 'shared/ is pure TypeScript' },
          ],
        },
      ],
      'no-restricted-globals': ['error', ...ioGlobals],
    },
  },
);
