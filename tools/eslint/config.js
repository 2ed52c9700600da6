// The one lint configuration of the repository (loaded by the root eslint.config.mjs, so paths here
// are relative to the repository root). It lives in tools/ because typescript-eslint needs the
// TypeScript compiler's JavaScript API, which only this workspace's TypeScript 5 has.
import './use-tools-typescript.js';
import { defineConfig } from 'eslint/config';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import boundaries from 'eslint-plugin-boundaries';
import globals from 'globals';

const FRONTEND = 'frontend/src';
const LINTED = ['backend/src', 'backend/test', 'frontend/src', 'e2e'];
const filesIn = (...folders) => folders.flatMap((folder) => [`${folder}/**/*.{ts,tsx,mts,cts,js,mjs,cjs}`]);

// Imports run one way: shared → features → app. A feature sees shared code and itself, never
// another feature; shared code sees only shared code.
const SHARED = ['lib', 'components', 'config', 'theme'];
// main.tsx, the entry, belongs to no element and may import anything.
const frontendElements = [
  { type: 'app', pattern: `${FRONTEND}/app/**`, partialMatch: false },
  { type: 'feature', pattern: `${FRONTEND}/features/*/**`, partialMatch: false, capture: ['feature'] },
  ...SHARED.map((folder) => ({ type: 'shared', pattern: `${FRONTEND}/${folder}/**`, partialMatch: false })),
];
// The server's list of record and check kinds, which imports nothing: the browser reads its words
// from it (lib/record-kinds.ts) instead of keeping a copy. No other server file is reachable.
const sharedWithServer = [{ category: 'server-kinds', pattern: 'backend/src/records/kinds.ts' }];

// Every server call in the browser app goes through the typed client (lib/api-client.ts), whose
// paths, bodies and answers come from the API description. Only the plain transport and the few
// files that must load without the typed client (the sign-in page stays small) send requests
// themselves: the transport, the client, who is signed in, signing in, the entries kept on the
// device (their paths are known only at run time) and the connection probe.
const PLAIN_TRANSPORT_FILES = [
  `${FRONTEND}/lib/api/fetch-json.ts`,
  `${FRONTEND}/lib/api-client.ts`,
  `${FRONTEND}/lib/session/get-me.ts`,
  `${FRONTEND}/lib/offline/commands.ts`,
  `${FRONTEND}/lib/offline/connection.ts`,
  `${FRONTEND}/features/auth/api/login.ts`,
];
const USE_CLIENT =
  "Call the server through `client` from lib/api-client.ts (typed from the API description): `answer(client.GET('/api/…', { params }))`.";
const API_PATH = '/^\\x2Fapi\\b/';
const plainTransportRules = {
  'no-restricted-imports': [
    'error',
    { patterns: [{ group: ['**/api/fetch-json', '**/api-client'], importNames: ['sendTo'], message: USE_CLIENT }] },
  ],
  'no-restricted-syntax': [
    'error',
    ...["CallExpression[callee.name='fetch']", "CallExpression[callee.property.name='fetch']"].flatMap((call) => [
      { selector: `${call} > Literal.arguments:first-child[value=${API_PATH}]`, message: USE_CLIENT },
      {
        selector: `${call} > TemplateLiteral.arguments:first-child > TemplateElement:first-child[value.raw=${API_PATH}]`,
        message: USE_CLIENT,
      },
    ]),
  ],
};

// typescript-eslint's recommended set without type information: the type-aware set took 3 min 13 s
// for the server and browser tests alone on this two-core machine (against 24 s) and mostly
// reports supertest's untyped bodies; each rule here looks at one file at a time.
export default defineConfig(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '**/.build/**',
      'frontend/src/lib/api/schema.d.ts',
      // Generated (tools/openapi): rewritten by the generator, never by hand.
      'backend/src/openapi/plugin-metadata.ts',
      'backend/src/openapi/response-schemas.ts',
      'e2e/screenshots/**',
      'e2e/test-results/**',
    ],
  },
  {
    files: filesIn(...LINTED),
    extends: [js.configs.recommended, ...tseslint.configs.recommended],
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // Names starting with an underscore are unused on purpose (a callback's position, a rest split).
      '@typescript-eslint/no-unused-vars': [
        'error',
        {
          argsIgnorePattern: '^_',
          varsIgnorePattern: '^_',
          caughtErrorsIgnorePattern: '^_',
          destructuredArrayIgnorePattern: '^_',
          ignoreRestSiblings: true,
        },
      ],
    },
  },
  {
    files: filesIn('backend/src', 'backend/test', 'e2e'),
    languageOptions: { globals: { ...globals.node } },
  },
  {
    files: ['backend/src/**/*.spec.ts', 'backend/test/**'],
    languageOptions: { globals: { ...globals.jest } },
  },
  {
    files: filesIn(FRONTEND),
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks, boundaries },
    settings: {
      'boundaries/elements': frontendElements,
      'boundaries/files': sharedWithServer,
      'import/resolver': { node: { extensions: ['.ts', '.tsx', '.js', '.d.ts'] } },
    },
    rules: {
      // The hooks rules and the React Compiler's checks, all as errors.
      ...reactHooks.configs['recommended-latest'].rules,
      'react-hooks/exhaustive-deps': 'error',
      // Off: it takes every name ending in "Ref" for a ref object, and the shared indicator hook hands
      // every entry grid a callback ref (`containerRef`) inside the object it returns, so each grid
      // passing that object on would be refused. The hook keeps its latest values in layout effects.
      'react-hooks/refs': 'off',
      // A browser file reaches no other file of the tree than the elements above and the kinds list.
      'boundaries/no-unknown-dependencies': 'error',
      'boundaries/dependencies': [
        'error',
        {
          default: 'disallow',
          policies: [
            {
              from: { element: { type: 'shared' } },
              allow: [{ to: { element: { type: 'shared' } } }, { to: { file: { categories: 'server-kinds' } } }],
            },
            {
              from: { element: { type: 'feature' } },
              allow: [
                { to: { element: { type: 'shared' } } },
                { to: { element: { type: 'feature', captured: { feature: '{{ from.element.captured.feature }}' } } } },
              ],
            },
            { from: { element: { type: 'app' } }, allow: { to: { element: { types: ['shared', 'feature', 'app'] } } } },
          ],
        },
      ],
    },
  },
  {
    files: filesIn(FRONTEND),
    ignores: PLAIN_TRANSPORT_FILES,
    rules: plainTransportRules,
  },
);
