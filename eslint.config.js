// ESLint 9 flat config: a small rule set that earns its keep. ESLint's and typescript-eslint's recommended rules
// (syntax only, no type information, so the whole repository lints in well under a minute), the two React hook
// rules, and no import that climbs three folders (use the @shared/ @db/ @server/ @components/ @layouts/ aliases).
// The layer rules of DEVELOPERS.md's "Layout" table (what each folder may import, types included, .astro files
// too) live in tests/unit/architecture.test.ts. A rule is switched off for a line only with a reason beside it.
import js from '@eslint/js';
import { defineConfig } from 'eslint/config';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default defineConfig(
  { ignores: ['dist/', '.astro/', '.data/', 'test-output/', 'public/', 'tests/unit/fixtures/'] },
  js.configs.recommended,
  tseslint.configs.recommended,
  {
    // The plain-Node scripts and config files are not type-checked, so `no-undef` guards their names.
    files: ['**/*.{js,mjs,cjs}'],
    languageOptions: { globals: globals.node },
  },
  {
    files: ['**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    rules: {
      // A leading underscore marks a value left unused on purpose (a dropped field, an ignored argument).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_', ignoreRestSiblings: true }],
      'no-restricted-imports': [
        'error',
        { patterns: [{ regex: '^(\\./)?(\\.\\./){3}', message: 'Climbs three folders: import across folders with an alias (@shared/, @db/, @server/, @components/, @layouts/).' }] },
      ],
    },
  },
  {
    // Migrations are frozen in time: they take Kysely<any>, never today's Database type (Kysely's migration pattern).
    files: ['db/migrations/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    // Tests and benches read the API's JSON answers loosely and state the shape they expect with expect(); the
    // answers' types are held by the contract the server and the islands share.
    files: ['tests/**', 'bench/**', '**/*.test.ts', '**/*.test.tsx'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
);
