// ESLint flat config: typescript-eslint (with type information for the promise rules), kebab-case
// file names, and one-way imports: shared -> server | (features -> app). See DEVELOPERS.md, "Gates".
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import checkFile from 'eslint-plugin-check-file';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import prettier from 'eslint-config-prettier';

const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);

export default tseslint.config(
  { ignores: ['dist/**', 'media/**', 'node_modules/**', 'coverage/**', '.data/**', 'tests/screenshots/**', 'server/public/**', 'bench/out/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: {
      globals: { ...globals.node, ...globals.browser },
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    plugins: { 'check-file': checkFile, 'import-x': importX },
    settings: { 'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })] },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true }],
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { attributes: false, arguments: false } }],
      '@typescript-eslint/await-thenable': 'error',
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      'no-restricted-syntax': ['error', { selector: 'ExportDefaultDeclaration', message: 'Use named exports (house style).' }],
      'check-file/filename-naming-convention': ['error', { '**/*.{ts,tsx,js}': 'KEBAB_CASE' }, { ignoreMiddleExtensions: true }],
      'check-file/folder-naming-convention': ['error', { '{src,server,shared,tests,scripts,bench}/**/': 'KEBAB_CASE' }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./server', './src', './scripts', './tests'], message: 'shared/ is used by both sides: it imports neither.' },
            { target: './server', from: './src', message: 'The server never imports the client.' },
            {
              target: ['./server/services', './server/policies', './server/models', './server/presenters', './server/jobs'],
              from: ['./server/routes', './server/middlewares'],
              message: 'Services, policies, models and presenters take plain values: the HTTP layer (routes, middlewares) calls them, never the reverse.',
            },
            { target: './src', from: ['./server', './scripts'], message: 'The client talks to the server through the API only.' },
            { target: './src/features', from: './src/app', message: 'Features never import the app layer: pages compose features.' },
            {
              target: ['./src/components', './src/lib', './src/config'],
              from: ['./src/features', './src/app'],
              message: 'Shared client code never imports features or pages.',
            },
            ...features.map((f) => ({
              target: `./src/features/${f}`,
              from: './src/features',
              except: [`./${f}`],
              message: 'Features never import each other: compose them in a page (src/app/routes).',
            })),
          ],
        },
      ],
    },
  },
  {
    files: ['src/**/*.tsx', 'src/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'error' },
  },
  {
    // Services take plain values (a User, ids, parsed input) and throw domain errors: no Express in them.
    files: ['server/services/**', 'server/policies/**', 'server/models/**', 'server/presenters/**', 'shared/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        { paths: [{ name: 'express', message: 'Services take plain values, never a Request; the route unpacks it (DEVELOPERS.md, "Writing a route").' }] },
      ],
    },
  },
  {
    // Routes read typed inputs from route()/openRoute(), never cast request fields.
    files: ['server/routes/**/*.router.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        { selector: 'ExportDefaultDeclaration', message: 'Use named exports (house style).' },
        {
          selector: "TSAsExpression[expression.object.name='req'], TSAsExpression[expression.object.object.name='req']",
          message: 'Give the route a zod schema (route({ params, body, query }, ...)) instead of casting a request field.',
        },
        {
          selector: "MemberExpression[object.name='req'][property.name=/^(params|query)$/]",
          message: 'Read the parsed `params` and `query` route()/openRoute() hand the handler, not Express’s raw ones.',
        },
        {
          selector:
            'CallExpression[callee.property.name=/^(get|post|put|patch|delete)$/] > :matches(ArrowFunctionExpression, FunctionExpression)[params.length>=2]',
          message: 'Wrap the handler in route() or openRoute() (server/lib/route.ts): 401, 400 and typed inputs come from there.',
        },
      ],
      // A router loads through the loaders and changes records through services: model types only.
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/models', '**/models/*'],
              allowTypeImports: true,
              message: 'Routers load with server/services/access.ts and call services; import model types only (DEVELOPERS.md, "Writing a route").',
            },
          ],
        },
      ],
    },
  },
  {
    // Config files, migrations and declarations of untyped packages follow their tools' conventions (default exports, umzug names).
    files: ['*.config.ts', '*.config.js', 'server/migrations/**', '**/global-setup.ts', 'tests/e2e/vitest.config.ts', 'tests/types/**'],
    rules: { 'no-restricted-syntax': 'off', 'check-file/filename-naming-convention': 'off' },
  },
  {
    // Tests and benches read loosely typed JSON on purpose.
    files: ['**/*.test.ts', 'tests/**', 'bench/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['**/*.js'],
    ...tseslint.configs.disableTypeChecked,
  },
  prettier,
);
