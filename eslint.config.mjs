// The house rules as lint rules. `npm run check` runs this beside the typecheck and Prettier;
// tests/lint/boundaries.test.ts shows each boundary rule failing on a deliberate violation.
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const NODE_BUILTINS = [
  'assert',
  'buffer',
  'child_process',
  'crypto',
  'events',
  'fs',
  'fs/promises',
  'http',
  'https',
  'net',
  'os',
  'path',
  'stream',
  'url',
  'util',
  'zlib',
];

/** shared/ is pure: no UI, no server frameworks, no Node, no clock. */
const sharedPurity = {
  files: ['shared/**/*.{ts,tsx}'],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        paths: NODE_BUILTINS.map((name) => ({ name, message: 'shared/ is pure TypeScript: no Node modules.' })),
        patterns: [
          { group: ['node:*'], message: 'shared/ is pure TypeScript: no Node modules.' },
          { group: ['react', 'react-*', 'react/*'], message: 'shared/ imports no React or React Native.' },
          { group: ['expo', 'expo-*', '@expo/*'], message: 'shared/ imports no Expo.' },
          { group: ['express', 'express-*', 'sequelize', 'sequelize/*'], message: 'shared/ imports no server framework.' },
          { group: ['@/server/*', '@/app/*', '@/components/*'], message: 'shared/ depends on nothing outside shared/.' },
        ],
      },
    ],
    'no-restricted-syntax': [
      'error',
      {
        selector: "CallExpression[callee.object.name='Date'][callee.property.name='now']",
        message: 'shared/ reads no clock: take the time as a parameter.',
      },
      {
        selector: "NewExpression[callee.name='Date'][arguments.length=0]",
        message: 'shared/ reads no clock: take the time as a parameter.',
      },
      {
        selector: "CallExpression[callee.object.name='performance'][callee.property.name='now']",
        message: 'shared/ reads no clock: take the time as a parameter.',
      },
    ],
  },
};

const RAW_TEXT_MESSAGE = "Only components/ui/ renders React Native's Text and TextInput; use the ui kit.";
const rawTextImport = { name: 'react-native', importNames: ['Text', 'TextInput'], message: RAW_TEXT_MESSAGE };

/** Client code: the ui kit owns Text/TextInput, routes never reach into the server, components never into routes. */
const clientBoundaries = [
  {
    files: ['app/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [rawTextImport],
          patterns: [{ group: ['@/server/*', '**/server/*'], message: 'Routes talk to the server through the API, never import it.' }],
        },
      ],
    },
  },
  {
    files: ['components/**/*.{ts,tsx}'],
    ignores: ['components/ui/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [rawTextImport],
          patterns: [
            { group: ['@/app/*', '**/app/*'], message: 'Components do not import routes; routes import components.' },
            { group: ['@/server/*', '**/server/*'], message: 'Client code talks to the server through the API, never imports it.' },
          ],
        },
      ],
    },
  },
  {
    files: ['components/ui/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['@/app/*', '**/app/*'], message: 'Components do not import routes; routes import components.' }] },
      ],
    },
  },
];

const MODELS_MESSAGE = 'Only repos (and the data layer) import db/models; go through the feature’s repo.';
const FOREIGN_REPO_MESSAGE = "Another feature's repo or model is reached through that feature's service or a shared access module.";

/** Server layering: router → service → repo → model; features meet through services. */
const serverBoundaries = [
  {
    files: ['server/features/**/*.router.ts', 'server/features/**/*.service.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/db/models', '**/db/models/*', '@/server/db/models/*'], message: MODELS_MESSAGE },
            { group: ['../*/*.repo', '@/server/features/*/*.repo'], message: FOREIGN_REPO_MESSAGE },
          ],
        },
      ],
    },
  },
  {
    files: ['server/features/**/*.ts'],
    ignores: ['server/features/**/*.router.ts', 'server/features/**/*.service.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['../*/*.repo', '@/server/features/*/*.repo'], message: FOREIGN_REPO_MESSAGE }] },
      ],
    },
  },
];

/** One way to reach the network from product code: the typed client (and the device simulator's transport). */
const fetchBoundary = {
  files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'shared/**/*.{ts,tsx}', 'server/**/*.ts'],
  ignores: ['shared/api/client.ts', 'server/simulator/transport.ts', 'server/bench/**'],
  rules: {
    'no-restricted-globals': [
      'error',
      { name: 'fetch', message: 'Use shared/api/client.ts (or the simulator transport); no other file calls fetch.' },
    ],
  },
};

export default tseslint.config(
  {
    ignores: [
      'node_modules/',
      'dist/',
      'build/',
      '.data/',
      '.cache/',
      '.expo/',
      'screenshots/',
      'server/cli/bin.js',
      'tests/lint/fixtures/',
      'expo-env.d.ts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      'no-console': 'off',
    },
  },
  {
    files: ['**/*.{js,cjs,mjs}'],
    languageOptions: { globals: { ...globals.node } },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  sharedPurity,
  ...clientBoundaries,
  ...serverBoundaries,
  fetchBoundary,
);
