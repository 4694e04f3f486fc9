// One flat config for the whole tree. Type-aware rules where the rules live (api/, shared/).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const typeAwareRules = {
  '@typescript-eslint/no-floating-promises': 'error',
  '@typescript-eslint/no-misused-promises': 'error',
  '@typescript-eslint/switch-exhaustiveness-check': [
    'error',
    { considerDefaultExhaustiveForUnions: true },
  ],
  '@typescript-eslint/consistent-type-imports': 'off',
  '@typescript-eslint/no-unused-vars': [
    'error',
    { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
  ],
};

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '**/data/**',
      'test-results/**',
      'playwright-report/**',
      '**/*.d.ts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['api/**/*.ts', 'shared/**/*.ts'],
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
      globals: globals.node,
    },
    rules: typeAwareRules,
  },
  {
    files: ['api/src/**/*.ts'],
    rules: {
      // Nest resolves injection tokens from the emitted metadata of constructor parameter types.
      '@typescript-eslint/consistent-type-imports': 'off',
    },
  },
  {
    files: ['storefront/**/*.{ts,tsx}', 'admin/**/*.{ts,tsx}', 'web-kit/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: globals.browser },
    rules: {
      ...reactHooks.configs.recommended.rules,
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: [
      'docker-free-scripts/**/*.{js,mjs}',
      'storefront/scripts/**/*.mjs',
      '*.js',
      '*.mjs',
      'e2e/**/*.ts',
    ],
    languageOptions: { globals: globals.node },
  },
);
