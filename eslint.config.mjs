import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import globals from 'globals';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';

// Client layering (STYLE.md): app → features → shared code, one way only; features never import each other.
const clientFeatures = readdirSync(new URL('./client/src/features', import.meta.url), {
  withFileTypes: true,
})
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

const featureBoundaries = clientFeatures.map((feature) => ({
  files: [`client/src/features/${feature}/**/*.{ts,tsx}`],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: [
          {
            regex: `^@/(app(/|$)|features/(?!${feature}(/|$)))`,
            message: 'A feature imports only itself and shared code; compose features in src/app.',
          },
        ],
      },
    ],
  },
}));

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '**/coverage/**',
      '.data/**',
      '**/test-results/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' },
      ],
      eqeqeq: ['error', 'always'],
      'no-console': 'off',
    },
  },
  {
    files: ['**/*.{js,mjs,cjs}', 'scripts/**', 'server/**', '**/bench/**', '**/e2e/**'],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    files: ['client/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
    },
  },
  ...featureBoundaries,
  {
    files: ['client/src/{components,lib,config,testing}/**/*.{ts,tsx}'],
    ignores: ['client/src/testing/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^@/(app|features)(/|$)',
              message: 'Shared client code does not depend on features or the app.',
            },
          ],
        },
      ],
    },
  },
  {
    // The shared package runs in the browser and on the server: no Node or DOM APIs in it.
    files: ['shared/src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['node:*', 'fs', 'path', 'react', '@nestjs/*', 'typeorm'],
              message: 'shared/ is pure: no I/O or framework imports.',
            },
          ],
        },
      ],
    },
  },
);
