// @ts-check
import { readdirSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import reactHooks from 'eslint-plugin-react-hooks';
import jsxA11y from 'eslint-plugin-jsx-a11y-x';
import vitest from '@vitest/eslint-plugin';
import jest from 'eslint-plugin-jest';
import playwright from 'eslint-plugin-playwright';
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
        projectService: { allowDefaultProject: ['shared/vitest.config.ts'] },
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
      // Named exports everywhere; the tools that load a config file want its default export (below).
      'import-x/no-default-export': 'error',
      // A switch over a union names every member (a default does not stand in for a missing case).
      '@typescript-eslint/switch-exhaustiveness-check': 'error',
    },
  },
  {
    // What a tool loads by its default export: config files, Jest's global set-up, and the type
    // declarations of a package that has one.
    files: ['**/*.config.{js,mjs,cjs,ts}', 'server/test/global-setup.ts', '**/*.d.ts'],
    rules: { 'import-x/no-default-export': 'off' },
  },
  {
    // The domain runs anywhere: no framework, no database, no Node. Its command-line faces (cli/) are
    // the exception: they run under Node by design.
    files: ['shared/src/**/*.ts'],
    ignores: ['shared/src/cli/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^node:',
              message: 'shared/ is pure TypeScript: no Node built-ins (the CLI under src/cli/ may use them).',
            },
            {
              regex:
                '^(assert|buffer|child_process|crypto|events|fs|http|https|net|os|path|perf_hooks|process|readline|stream|url|util|worker_threads|zlib)(/.*)?$',
              message: 'shared/ is pure TypeScript: no Node built-ins (the CLI under src/cli/ may use them).',
            },
            {
              regex:
                '^(react|react-dom|react-router|@tanstack/.*|@nestjs/.*|express|class-validator|class-transformer)(/.*)?$',
              message: 'shared/ holds the domain only: no framework; the apps import shared, not the other way.',
            },
            {
              regex: '^(typeorm|pg|idb|dexie)(/.*)?$',
              message: 'shared/ does no I/O: no database; the server and the client store what shared computes.',
            },
          ],
        },
      ],
    },
  },
  {
    // A test must assert: Vitest in shared/ and client/ (jest-dom's matchers go through expect too),
    // Jest in the server, Playwright in the browser flows.
    files: ['shared/src/**/*.test.ts', 'client/src/**/*.test.{ts,tsx}'],
    plugins: { vitest },
    rules: {
      // expect, expect.soft, expectTypeOf and helpers named expect… (e.g. expectCode) that call it.
      'vitest/expect-expect': ['error', { assertFunctionNames: ['expect*', 'assert'] }],
    },
  },
  {
    files: ['server/test/**/*.e2e-spec.ts', 'server/src/**/*.spec.ts'],
    plugins: { jest },
    rules: { 'jest/expect-expect': ['error', { assertFunctionNames: ['expect*'] }] },
  },
  {
    files: ['client/e2e/**/*.spec.ts'],
    plugins: { playwright },
    rules: { 'playwright/expect-expect': ['error', { assertFunctionNames: ['expect*'] }] },
  },
  {
    files: ['**/*.js', '**/*.mjs', '**/*.cjs'],
    ...tseslint.configs.disableTypeChecked,
  },
  {
    files: ['client/src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks, 'jsx-a11y-x': jsxA11y },
    languageOptions: { globals: { ...globals.browser } },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // The maintained fork of jsx-a11y: the original has no release for ESLint 10.
      ...jsxA11y.configs.strict.rules,
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
  {
    // Sample vehicles and hand-built checklists stay out of what ships: tests, browser flows, benchmarks
    // and scripts take them from @yardcall/shared/testing; screens, routes and services never do.
    files: ['client/src/**/*.{ts,tsx}', 'server/src/**/*.ts'],
    ignores: ['**/*.test.{ts,tsx}', '**/*.spec.ts', '**/*.bench.ts', 'client/src/testing/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [
            {
              name: '@yardcall/shared/testing',
              message:
                'Test fixtures are for tests, e2e, benchmarks and scripts; production code uses @yardcall/shared.',
            },
          ],
        },
      ],
    },
  },
  prettier,
);
