import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'drizzle/', 'test-results/', '.data/', 'coverage/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
      'prefer-const': ['error', { ignoreReadBeforeAssign: true }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    // shared/ is pure, isomorphic code: it may not reach into the server, the client, or Node's I/O.
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { regex: '(^|/)(server|src)(/|$)', message: 'shared/ must not import from server/ or src/.' },
            { regex: '^node:', message: 'shared/ is isomorphic: no Node built-ins.' },
            { regex: '^(fs|path|os|child_process|http|https|net|crypto)$', message: 'shared/ is isomorphic: no Node built-ins.' },
          ],
        },
      ],
    },
  },
  {
    // Tests read loosely-typed JSON answers; asserting on them is the type check.
    files: ['tests/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    // The client never imports server code.
    files: ['src/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ regex: '(^|/)server(/|$)', message: 'src/ must not import from server/.' }] }],
    },
  },
);
