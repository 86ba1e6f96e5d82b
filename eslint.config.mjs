// Lint: ESLint's and typescript-eslint's recommended rules, the type-aware ones for TypeScript.
// Formatting is Prettier's job (npm run format); no stylistic rules here.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', '.build/', 'coverage/', 'src/nn/kernel/kernel-bytes.ts'] },
  js.configs.recommended,
  {
    files: ['**/*.mjs', '**/*.js'],
    languageOptions: {
      globals: Object.fromEntries(
        [
          'process',
          'console',
          'Buffer',
          'URL',
          'setTimeout',
          'clearTimeout',
          'setImmediate',
          'performance',
          'structuredClone',
        ].map((name) => [name, 'readonly']),
      ),
    },
  },
  {
    files: ['**/*.ts'],
    extends: [...tseslint.configs.recommendedTypeChecked],
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': [
        'error',
        { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false },
      ],
      // Finding and escaping control characters is part of the job (untrusted repository strings).
      'no-control-regex': 'off',
    },
  },
  {
    // Tests read JSON documents the code wrote and poke at them: `any` from JSON.parse is the point there.
    files: ['test/**/*.ts', 'bench/**/*.ts'],
    rules: {
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      '@typescript-eslint/no-explicit-any': 'off',
      // tfjs's typings need assertions the checker calls unnecessary.
      '@typescript-eslint/no-unnecessary-type-assertion': 'off',
    },
  },
);
