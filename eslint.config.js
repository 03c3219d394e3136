// The project's lint: TypeScript syntax rules, and the layering of DEVELOPERS.md as boundary rules over resolved
// imports (static, re-exports and dynamic import()), so a route that reaches for knex fails `npm run lint`.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import boundaries from 'eslint-plugin-boundaries';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import hoopwrightForms from './eslint-rules/form-needs-use-form.js';

/** Shared server folders: every module may use them; they never use a module. */
const sharedServer = ['engine', 'contracts', 'middleware', 'auth', 'integrations', 'db'];
/**
 * A module's files by layer, told apart by name: `*routes.ts`, `*-repo.ts`, `*-types.ts` (shapes only, which any
 * layer may use), and everything else is a service.
 */
const ROUTE = '*routes.ts';
const REPO = '*-repo.ts';
const SERVICE = '!(*routes|*-repo|*-types).ts';
const inModule = (layer, captured) => ({
  element: { type: 'module', ...(layer ? { fileInternalPath: layer } : {}), ...(captured ? { captured } : {}) },
});
const sameModule = { module: '{{from.captured.module}}' };
const element = (type, captured) => ({ element: captured ? { type, captured } : { type } });

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-results/**', 'playwright-report/**', 'coverage/**'] },
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    extends: [js.configs.recommended, tseslint.configs.recommended],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true },
      ],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      'no-console': 'off',
    },
  },
  {
    // Rows come out of knex untyped; each repo maps them to a domain type straight away.
    files: ['server/src/modules/*/*-repo.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    // Services tell the flow and own the transaction; the SQL lives in their module's repos.
    files: ['server/src/modules/*/!(*-repo).ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: 'CallExpression[callee.name=/^(db|trx|knex)$/], CallExpression[callee.property.name=/^(db|trx)$/]',
          message: 'a service reads and writes rows through its repo, not with a query of its own',
        },
        {
          selector:
            'MemberExpression[object.name=/^(db|trx)$/][property.name=/^(raw|select|insert|update|from|table)$/]',
          message: 'a service reads and writes rows through its repo, not with a query of its own',
        },
      ],
    },
  },
  {
    files: ['storefront/src/**/*.tsx', 'admin/src/**/*.tsx', 'ui/src/**/*.tsx'],
    plugins: { 'react-hooks': reactHooks, 'hoopwright-forms': hoopwrightForms },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'hoopwright-forms/form-needs-use-form': 'error' },
  },
  {
    files: ['server/src/**/*.ts', 'storefront/src/**/*.{ts,tsx}', 'admin/src/**/*.{ts,tsx}', 'ui/src/**/*.{ts,tsx}'],
    plugins: { boundaries },
    settings: {
      'import/resolver': {
        typescript: { project: ['tsconfig.json', 'tsconfig.apps.json'], noWarnOnMultipleProjects: true },
      },
      'boundaries/dependency-nodes': ['import', 'export', 'dynamic-import'],
      'boundaries/elements': [
        { type: 'module', pattern: 'server/src/modules/*', capture: ['module'] },
        ...sharedServer.map((type) => ({ type, pattern: `server/src/${type}` })),
        { type: 'server', pattern: 'server/src' },
        { type: 'feature', pattern: '*/src/features/*', capture: ['app', 'feature'] },
        { type: 'app', pattern: '(storefront|admin|ui)/src', capture: ['app'] },
      ],
    },
    rules: {
      'boundaries/dependencies': [
        2,
        {
          default: 'allow',
          checkInternals: true,
          policies: [
            // Server: inside a module routes → services → repos → knex; across modules only through services.
            {
              from: inModule(),
              disallow: { to: [inModule(ROUTE), inModule(REPO)] },
              message: "modules talk through each other's services, never their routes or repos",
            },
            { from: inModule(), allow: { to: [inModule(ROUTE, sameModule), inModule(REPO, sameModule)] } },
            {
              from: inModule(ROUTE),
              disallow: { to: [inModule(REPO), element('db')] },
              message: 'a route validates, calls a service and answers: it never sees a repo or knex',
            },
            {
              from: inModule(REPO),
              disallow: { to: [inModule(SERVICE), inModule(ROUTE)] },
              message: 'a repo reads and writes rows: it never imports a service or a route',
            },
            {
              // A repo may name an integration's data shapes (a font file) but never call one.
              from: inModule(REPO),
              disallow: { to: element('integrations') },
              dependency: { kind: 'value' },
              message: 'a repo reads and writes rows: it never calls an integration',
            },
            { from: inModule(SERVICE), disallow: { to: inModule(ROUTE) }, message: 'a service never imports a route' },
            {
              from: sharedServer.map((type) => element(type)),
              disallow: { to: [inModule(), { element: { type: 'server', fileInternalPath: '(app|main|worker).ts' } }] },
              message: 'shared server code never imports a module or the entry points',
            },
            {
              from: element('engine'),
              disallow: { to: ['middleware', 'auth', 'integrations', 'db'].map((type) => element(type)) },
              message: 'the engine is pure: no I/O, no Express, no knex',
            },
            {
              from: element('contracts'),
              disallow: { to: sharedServer.filter((type) => type !== 'contracts').map((type) => element(type)) },
              message: 'contracts import only zod and each other',
            },
            // Apps: only the server's pure contracts and engine; never each other; features never import features.
            {
              from: [element('app'), element('feature')],
              disallow: {
                to: [
                  inModule(),
                  element('server'),
                  ...['middleware', 'auth', 'integrations', 'db'].map((type) => element(type)),
                ],
              },
              message: "the apps use only the server's contracts and engine",
            },
            {
              from: [element('app', { app: 'storefront' }), element('feature', { app: 'storefront' })],
              disallow: { to: [element('app', { app: 'admin' }), element('feature', { app: 'admin' })] },
              message: 'the storefront never imports the studio app',
            },
            {
              from: [element('app', { app: 'admin' }), element('feature', { app: 'admin' })],
              disallow: { to: [element('app', { app: 'storefront' }), element('feature', { app: 'storefront' })] },
              message: 'the studio app never imports the storefront',
            },
            {
              from: element('app', { app: 'ui' }),
              disallow: { to: [element('app', { app: '(storefront|admin)' }), element('feature')] },
              message: 'the shared ui imports neither app',
            },
            {
              from: element('feature'),
              disallow: { to: element('feature') },
              message: 'a feature never imports another feature; pages in app/routes compose them',
            },
            {
              from: element('feature'),
              allow: { to: element('feature', { app: '{{from.captured.app}}', feature: '{{from.captured.feature}}' }) },
            },
          ],
        },
      ],
    },
  },
);
