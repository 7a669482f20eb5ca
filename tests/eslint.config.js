// ESLint flat config. Run from the repository root (`npm run lint` passes --config), so paths below are from there.
const expoConfig = require('eslint-config-expo/flat');

module.exports = [
  ...expoConfig,
  {
    ignores: ['dist/**', 'data/**', 'node_modules/**', '.expo/**', 'tests/e2e/screenshots/**', 'tests/e2e/results/**'],
  },
  {
    rules: {
      'import/no-unresolved': 'off',
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
    },
  },
  {
    // Tests load modules after setting the environment they read, so they use require() on purpose.
    files: ['tests/**/*.ts', 'tests/**/*.tsx'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
];
