// ESLint flat config. The import-boundary rules carry the layering of DEVELOPERS.md ("Layout"):
// shared-core is pure and deterministic; the renderer reaches Node, Electron and the physics only through
// the assessment (shared-core/site) run in its worker.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import { builtinModules } from 'node:module';

const nodeBuiltins = [...builtinModules, ...builtinModules.map((m) => `node:${m}`)];
const ours = (folder) => [`**/${folder}`, `**/${folder}/**`];
const TOPICS = [
  'water',
  'profile',
  'gravity-currents',
  'estuaries',
  'internal-waves',
  'hydraulics',
  'withdrawal',
  'inflows',
  'jets',
  'mixing-zone',
  'numerics',
  'uncertainty',
];

const sharedCoreImports = {
  paths: [...nodeBuiltins, 'electron', 'svelte'].map((name) => ({
    name,
    message: 'shared-core is pure: no Node, Electron or UI.',
  })),
  patterns: [
    { group: ['node:*', 'electron/*', 'svelte/*'], message: 'shared-core is pure: no Node, Electron or UI.' },
    {
      group: [...ours('src-main'), ...ours('src-renderer'), ...ours('test'), ...ours('bench'), ...ours('scripts')],
      message: 'shared-core imports nothing of ours outside itself.',
    },
  ],
};

const rendererImports = {
  paths: [...nodeBuiltins, 'electron'].map((name) => ({
    name,
    message: 'The renderer never reaches Node or Electron; use the bridge.',
  })),
  patterns: [
    {
      group: ['node:*', 'electron/*', ...ours('src-main')],
      message: 'The renderer never reaches Node or Electron; use the bridge.',
    },
    {
      group: TOPICS.flatMap((t) => ours(`shared-core/${t}`)),
      allowTypeImports: true,
      message: 'The renderer does no physics: read the assessment (its worker runs shared-core/site).',
    },
  ],
};

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'out/', 'coverage/', 'test/.artifacts/', 'bin/cli-bundle.js', '**/*.cjs'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...svelte.configs['flat/recommended'],
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
      '@typescript-eslint/no-non-null-assertion': 'off',
      'no-empty': ['error', { allowEmptyCatch: true }],
      // state holds values replaced whole (DEVELOPERS.md, style): plain Map/URL instances are never mutated in place
      'svelte/prefer-svelte-reactivity': 'off',
    },
  },
  { files: ['test/**/*.ts', 'bench/**/*.ts'], rules: { '@typescript-eslint/no-explicit-any': 'off' } },
  {
    files: ['**/*.svelte', '**/*.svelte.ts'],
    languageOptions: { parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.svelte'] } },
  },
  {
    files: ['shared-core/**/*.ts'],
    languageOptions: { globals: {} },
    rules: {
      '@typescript-eslint/no-restricted-imports': ['error', sharedCoreImports],
      'no-console': 'error',
      'no-restricted-globals': [
        'error',
        'window',
        'document',
        'process',
        'performance',
        'crypto',
        'setTimeout',
        'setInterval',
      ],
      'no-restricted-properties': [
        'error',
        { object: 'Math', property: 'random', message: 'shared-core is deterministic: use the seeded sampler.' },
        { object: 'Date', property: 'now', message: 'shared-core has no clock.' },
      ],
      'no-restricted-syntax': [
        'error',
        { selector: "NewExpression[callee.name='Date']", message: 'shared-core has no clock.' },
      ],
    },
  },
  {
    files: ['src-renderer/**/*.ts', 'src-renderer/**/*.svelte'],
    languageOptions: { globals: { ...globals.browser } },
    rules: { '@typescript-eslint/no-restricted-imports': ['error', rendererImports] },
  },
);
