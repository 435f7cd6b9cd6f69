// ESLint flat config, kept in .ci/ so the repository's top level stays small.
// Run from the repository root (npm scripts do): eslint --config .ci/eslint.config.js .
// With --config, ESLint 9 resolves the patterns below against the working directory.
import path from 'node:path';
import { defineConfig } from 'eslint/config';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import comments from '@eslint-community/eslint-plugin-eslint-comments/configs';
import prettier from 'eslint-config-prettier';

const root = path.resolve(import.meta.dirname, '..');

const PACKAGES = new Set(['react', 'konva', 'zustand']);

/** One no-restricted-imports block per layer: the folders (under src/) and packages it must not import. */
function layerRules(forbidden) {
  return Object.entries(forbidden).map(([layer, names]) => ({
    files: [`${layer}/**/*.{ts,tsx}`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: names.map((name) =>
            PACKAGES.has(name)
              ? { group: [name, `${name}/*`, `react-${name}`], message: `${layer} must not import ${name}.` }
              : {
                  group: [`**/${name}`, `**/${name}/*`],
                  message: `${layer} must not import src/${name} (see DEVELOPERS.md, Architecture).`,
                },
          ),
        },
      ],
    },
  }));
}

export default defineConfig(
  { ignores: ['dist/', 'node_modules/', 'test-artifacts/', 'coverage/'] },
  {
    // A disable that no longer hides anything is an error, so stale ones get removed.
    linterOptions: { reportUnusedDisableDirectives: 'error', reportUnusedInlineConfigs: 'error' },
  },
  js.configs.recommended,
  comments.recommended,
  {
    rules: {
      // Every eslint-disable says why: `// eslint-disable-next-line rule -- reason`.
      '@eslint-community/eslint-comments/require-description': ['error', { ignore: [] }],
      // Missing effect dependencies are bugs; fix the dependencies instead.
      '@eslint-community/eslint-comments/no-restricted-disable': ['error', 'react-hooks/exhaustive-deps'],
    },
  },
  {
    files: ['**/*.{ts,tsx}'],
    extends: [tseslint.configs.recommendedTypeChecked, reactHooks.configs.flat['recommended-latest']],
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: root },
    },
    rules: {
      'react-hooks/exhaustive-deps': 'error',
      // Same convention as tsc's noUnusedParameters: a leading underscore marks "unused on purpose".
      '@typescript-eslint/no-unused-vars': [
        'error',
        {
          argsIgnorePattern: '^_',
          varsIgnorePattern: '^_',
          caughtErrorsIgnorePattern: '^_',
          destructuredArrayIgnorePattern: '^_',
        },
      ],
      eqeqeq: ['error', 'smart'],
    },
  },
  // Imports point one way (DEVELOPERS.md, Architecture): ui -> state -> worker -> core;
  // state -> document -> core; cli -> document -> core.
  ...layerRules({
    'src/core': ['document', 'state', 'worker', 'ui', 'cli', 'react', 'konva', 'zustand'],
    'src/document': ['state', 'worker', 'ui', 'cli', 'react'],
    'src/worker': ['document', 'state', 'ui', 'cli', 'react'],
    'src/state': ['ui', 'cli', 'react'],
    'src/ui': ['document', 'worker', 'core', 'cli'],
    'src/cli': ['state', 'worker', 'ui', 'react'],
  }),
  {
    // Plain JavaScript (this file) is outside tsconfig.json: lint it without type information.
    files: ['**/*.{js,mjs,cjs}'],
    extends: [tseslint.configs.disableTypeChecked],
  },
  // Last: turn off every stylistic rule that Prettier owns.
  prettier,
);
