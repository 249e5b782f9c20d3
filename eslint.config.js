// One lint configuration for the workspace; it enforces the layout rules of DEVELOPERS.md.
import { existsSync, readdirSync } from 'node:fs';
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import { apiFolderLoops } from './eslint/api-folder-loops.js';

const webFeatures = './apps/web/src/features';
const features = existsSync(webFeatures) ? readdirSync(webFeatures) : [];

export default tseslint.config(
  {
    ignores: [
      '**/dist/',
      '**/node_modules/',
      '.data/',
      '.tools/',
      '**/coverage/',
      '**/test-results/',
      '**/playwright-report/',
      'bench-results/',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [
        createTypeScriptImportResolver({
          project: ['apps/*/tsconfig.json', 'packages/*/tsconfig.json'],
          noWarnOnMultipleProjects: true,
        }),
      ],
    },
    rules: {
      'import-x/no-cycle': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['apps/api/src/**/*.ts'],
    plugins: { catline: { rules: { 'api-folder-loops': apiFolderLoops } } },
    // A feature depends on another (or on cycle-changes/) in one direction only; see DEVELOPERS.md.
    rules: { 'no-console': 'error', 'catline/api-folder-loops': 'error' },
  },
  {
    // The shared packages stay framework-free so server and browser can both use them.
    files: ['packages/*/src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: ['@nestjs/*', 'react', 'react-*', 'typeorm', 'socket.io*', '@chakra-ui/*'] },
      ],
    },
  },
  {
    // The web app's service worker runs in the worker's own scope, not the page's.
    files: ['apps/web/public/sw.js'],
    languageOptions: { globals: { ...globals.serviceworker } },
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      // Features do not import each other; shared code lives in components/ or lib/.
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: features.map((feature) => ({
            target: `${webFeatures}/${feature}`,
            from: webFeatures,
            except: [`./${feature}`],
            message: 'Features do not import each other: move shared code to src/components or src/lib.',
          })),
        },
      ],
    },
  },
);
