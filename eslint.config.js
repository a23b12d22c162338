import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['node_modules', 'db/migrations', '.data', 'coverage'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', ignoreRestSiblings: true }],
    },
  },
  {
    // The domain core stays pure: plain functions over plain data, no I/O, no framework.
    files: ['src/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['hono', 'hono/*', '@hono/*'], message: 'src/ is framework-free.' },
            { group: ['drizzle-orm', 'drizzle-orm/*', 'postgres', '@electric-sql/*'], message: 'src/ does no I/O.' },
            { group: ['node:*', 'fs', 'path', 'os', 'child_process', 'http', 'crypto'], message: 'src/ does no I/O.' },
            { group: ['../api/*', '../../api/*', '../db/*', '../../db/*'], message: 'src/ must not depend on api/ or db/.' },
          ],
        },
      ],
    },
  },
);
