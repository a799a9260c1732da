// @ts-check
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import reactHooks from 'eslint-plugin-react-hooks';
import prettier from 'eslint-config-prettier';
import globals from 'globals';

const clientFeatures = (() => {
  try {
    return readdirSync(new URL('./client/src/features', import.meta.url), { withFileTypes: true })
      .filter((entry) => entry.isDirectory())
      .map((entry) => entry.name);
  } catch {
    return [];
  }
})();

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '.data/**',
      '.test-output/**',
      '**/coverage/**',
      'client/public/**',
      '**/test-results/**',
      '**/playwright-report/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: {
        projectService: { allowDefaultProject: ['shared/vitest.config.ts', 'client/playwright.config.ts'] },
        tsconfigRootDir: import.meta.dirname,
      },
      globals: { ...globals.node },
    },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [
        createTypeScriptImportResolver({
          project: ['*/tsconfig.json', 'tsconfig.json'],
          noWarnOnMultipleProjects: true,
        }),
      ],
    },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-default-export': 'off',
    },
  },
  {
    files: ['**/*.js', '**/*.mjs', '**/*.cjs'],
    ...tseslint.configs.disableTypeChecked,
  },
  {
    files: ['client/src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: { ...globals.browser } },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // app -> features -> lib/components; no feature imports another feature.
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './client/src/features',
              from: './client/src/app',
              message: 'Features must not import from app/.',
            },
            {
              target: './client/src/lib',
              from: ['./client/src/app', './client/src/features'],
              message: 'lib/ is imported by app and features, never the other way.',
            },
            {
              target: './client/src/components',
              from: ['./client/src/app', './client/src/features'],
              message: 'components/ui is shared; it must not import app or features.',
            },
            ...clientFeatures.map((feature) => ({
              target: `./client/src/features/${feature}`,
              from: './client/src/features',
              except: [`./${feature}`],
              message: 'A feature must not import another feature; move the shared part to lib/ or components/.',
            })),
          ],
        },
      ],
    },
  },
  {
    files: ['server/src/**/*.ts', 'server/test/**/*.ts'],
    rules: {
      // Nest's decorators and DI use classes with empty constructors and unbound methods.
      '@typescript-eslint/no-extraneous-class': 'off',
      '@typescript-eslint/unbound-method': 'off',
    },
  },
  prettier,
);
