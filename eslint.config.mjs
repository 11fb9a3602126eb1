// Lint as `npm run lint` and as a stage of `npm test`: Next.js's rules (React, hooks, jsx-a11y, Core Web Vitals)
// with TypeScript's, formatting left to Prettier (eslint-config-prettier turns off the rules it owns).
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';
import prettier from 'eslint-config-prettier/flat';

const config = [
  ...nextVitals,
  ...nextTypescript,
  prettier,
  {
    rules: {
      // Unused names are mistakes, except the ones a signature must name (`_req`) or a rest pattern leaves out.
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none', ignoreRestSiblings: true },
      ],
    },
  },
  {
    rules: {
      // About what the React Compiler can memoize; Kerfwise does not run the compiler (react-hook-form's watch is fine).
      'react-hooks/incompatible-library': 'off',
    },
  },
  {
    // PDF documents (@react-pdf/renderer): their Image is a picture in a PDF, not an HTML img with alt text.
    files: ['lib/**/*-pdf.tsx'],
    rules: { 'jsx-a11y/alt-text': 'off' },
  },
  {
    ignores: ['node_modules/**', '.next/**', '.next-*/**', 'test-results/**', 'data/**', 'db/migrations/**', 'next-env.d.ts', 'public/**'],
  },
];

export default config;
