// ESLint flat config, at the root where editors find it. Formatting is Prettier's (`npm run lint` runs both).
const expoConfig = require('eslint-config-expo/flat');
const simpleImportSort = require('eslint-plugin-simple-import-sort');

module.exports = [
  ...expoConfig,
  {
    ignores: ['dist/**', 'data/**', 'node_modules/**', '.expo/**', 'tests/e2e/screenshots/**', 'tests/e2e/results/**'],
  },
  {
    plugins: { 'simple-import-sort': simpleImportSort },
    rules: {
      'import/no-unresolved': 'off',
      'import/order': 'off',
      'simple-import-sort/imports': 'error',
      'simple-import-sort/exports': 'error',
    },
  },
  {
    files: ['**/*.ts', '**/*.tsx'],
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
    },
  },
  {
    // Tests load modules after setting the environment they read, so they use require() on purpose.
    files: ['tests/**/*.ts', 'tests/**/*.tsx'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
];
