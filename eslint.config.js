// ESLint for the whole monorepo. The import-boundary rules keep the layers apart: packages/chem
// imports no app, no Node and no DOM library; web features do not import each other; TypeORM
// values are used only in the API's modules and db folders.
import { readdirSync, existsSync } from 'node:fs';
import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const featuresDir = 'apps/web/src/features';
const features = existsSync(featuresDir)
  ? readdirSync(featuresDir, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name)
  : [];

export default tseslint.config(
  { ignores: ['**/node_modules/**', 'dist/**', '.data/**', 'coverage/**', '**/*.d.ts.map'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
  {
    files: ['packages/chem/src/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['node:*', 'fs', 'path', 'crypto', 'os'], message: 'packages/chem runs in browsers and workers too: no Node imports.' },
            { group: ['**/apps/**', '@ionfolio/api', '@ionfolio/web', '@ionfolio/fakes'], message: 'packages/chem imports no app.' },
            { group: ['react', 'react-dom', 'typeorm', 'express', 'pg'], message: 'packages/chem is pure science: no framework imports.' },
          ],
        },
      ],
    },
  },
  {
    files: ['apps/api/src/**/*.ts'],
    ignores: ['apps/api/src/modules/**', 'apps/api/src/db/**', 'apps/api/src/testing/**'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { paths: [{ name: 'typeorm', message: 'TypeORM lives under modules/ and db/ only.', allowTypeImports: true }] },
      ],
    },
  },
  ...features.map((name) => ({
    files: [`${featuresDir}/${name}/**/*.{ts,tsx}`],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: features
            .filter((other) => other !== name)
            .map((other) => ({
              group: [`**/features/${other}`, `**/features/${other}/**`, `@/features/${other}/**`],
              message: 'Features do not import each other; compose them in app/.',
            })),
        },
      ],
    },
  })),
);
