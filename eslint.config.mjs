// ESLint 9 flat config: Next.js's rules (React, react-hooks with the React Compiler checks such as
// react-hooks/refs against reading or writing refs during render, core web vitals, jsx-a11y) and
// typescript-eslint's recommended rules, plus the layout rules of DEVELOPERS.md ("Layout").
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';

/** Only the engine's public surface is imported from outside lib/geometry. */
const ENGINE_INDEX_ONLY = {
  group: ['@/lib/geometry/*', '**/lib/geometry/*', '../geometry/*', '../../lib/geometry/*'],
  message: "Import the engine through its public surface, '@/lib/geometry' (lib/geometry/index.ts).",
};

/** Nothing in lib/ outside the HTTP edge (lib/api, lib/auth) knows about the framework or React. */
const NO_FRAMEWORK_IN_LIB = [
  { group: ['next', 'next/*'], message: 'lib/ stays free of Next.js: only lib/api and lib/auth import next/*. Throw a domain error (lib/errors.ts) instead.' },
  { group: ['react', 'react-dom', 'react/*', 'react-dom/*'], message: 'lib/ holds no React: put hooks and components under components/.' },
];

const config = [
  ...nextVitals,
  ...nextTypescript,
  {
    ignores: ['.next*/**', 'node_modules/**', 'public/**', 'coverage/**', 'data/**', 'test-data/**', 'tmp-*/**', 'next-env.d.ts', 'tsconfig.tsbuildinfo'],
  },
  {
    name: 'chordline/layout',
    files: ['**/*.{ts,tsx,mts,mjs,js}'],
    // Tests may check the engine's modules one by one; everything else goes through the index.
    ignores: ['lib/geometry/**', 'tests/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [ENGINE_INDEX_ONLY] }],
    },
  },
  {
    name: 'chordline/lib-without-framework',
    files: ['lib/**/*.{ts,tsx}'],
    ignores: ['lib/api/**', 'lib/auth/**', 'lib/geometry/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [ENGINE_INDEX_ONLY, ...NO_FRAMEWORK_IN_LIB] }],
    },
  },
  {
    name: 'chordline/engine-without-framework',
    files: ['lib/geometry/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: NO_FRAMEWORK_IN_LIB }],
    },
  },
  {
    name: 'chordline/tests',
    files: ['tests/**/*.ts'],
    rules: {
      // Tests read arbitrary JSON answers and poke hostile values into documents on purpose.
      '@typescript-eslint/no-explicit-any': 'off',
    },
  },
  {
    name: 'chordline/unused',
    rules: {
      // An unused name is an error; a leading underscore marks one kept on purpose.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
];

export default config;
