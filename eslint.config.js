// ESLint flat config, at the root where editors find it. Formatting is Prettier's (`npm run lint` runs both).
const expoConfig = require('eslint-config-expo/flat');
const simpleImportSort = require('eslint-plugin-simple-import-sort');

module.exports = [
  ...expoConfig,
  {
    ignores: [
      'dist/**',
      'data/**',
      'node_modules/**',
      '.expo/**',
      'tests/e2e/screenshots/**',
      'tests/e2e/results/**',
      'tests/bench/empty-app/dist/**',
    ],
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

  {
    // The sign-in path is the first load on a phone: it takes design-system pieces file by file, since the barrel
    // brings the icons (and an SVG library) and everything else in it; the signed-in screens load later, on demand.
    files: [
      'app/_layout.tsx',
      'app/+not-found.tsx',
      'app/(auth)/**',
      'components/auth/**',
      'components/screens/routes.tsx',
    ],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [
            {
              name: '@/components/ui',
              message: 'On the sign-in path, import the piece itself: @/components/ui/Button.',
            },
            {
              name: '@/components/screens',
              message: 'Signed-in screens load on demand through components/screens/routes.tsx.',
            },
          ],
        },
      ],
    },
  },

  {
    // Signed-in routes only say which screen they show; the screen and all it uses load on demand, as one chunk.
    files: ['app/(app)/**', 'app/print/**', 'app/c/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(?!@/components/screens/routes$)',
              message: 'Use lazyScreen() from @/components/screens/routes.',
            },
          ],
        },
      ],
    },
  },
];
