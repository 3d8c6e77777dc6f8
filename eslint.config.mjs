// Lint for the whole repository: typescript-eslint, hooks rules, safe regular expressions and feature boundaries.
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import regexp from 'eslint-plugin-regexp';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// A feature may use the shared layers (api/, components/, lib/, app/routes/paths) but not another feature's files.
const otherFeature = (depth) => ({
  regex: `^${'\\.\\./'.repeat(depth)}(?!\\.\\./)[^/]+/`,
  message: "A feature does not reach into another feature's files: move what both need to src-client/api, components or lib.",
});

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', '.data/', '.run/', 'coverage/', 'src-client/lib/api-types.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  regexp.configs['flat/recommended'],
  {
    languageOptions: { ecmaVersion: 2023, sourceType: 'module', globals: { ...globals.node } },
    rules: {
      // Nested unbounded repetition (catastrophic backtracking) is refused everywhere, not only in the server.
      'regexp/no-super-linear-backtracking': 'error',
      'regexp/no-super-linear-move': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    files: ['src-client/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  { files: ['src-client/features/*/*.{ts,tsx}'], rules: { 'no-restricted-imports': ['error', { patterns: [otherFeature(1)] }] } },
  { files: ['src-client/features/*/*/*.{ts,tsx}'], rules: { 'no-restricted-imports': ['error', { patterns: [otherFeature(2)] }] } },
  {
    files: ['src-client/{api,components,lib}/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['**/features/**'], message: 'Shared client code does not depend on a feature.' }] }],
    },
  },
  {
    files: ['src-server/rf/**/*.ts', 'src-server/compatibility/engine/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['@nestjs/*', 'typeorm', 'mysql2'], message: 'Pure computation stays free of Nest and the database.' }] },
      ],
    },
  },
  { files: ['**/*.{js,mjs,cjs}'], rules: { '@typescript-eslint/no-require-imports': 'off' } },
  { files: ['test/**/*.{ts,js}', '**/*.spec.ts', '**/*.test.{ts,tsx}'], languageOptions: { globals: { ...globals.jest } } },
  prettier,
);
