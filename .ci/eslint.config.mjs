// Lint rules for src/ and test/: the recommended sets of ESLint and typescript-eslint, with
// formatting left to Prettier (eslint-config-prettier turns the overlapping rules off).
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  {
    ignores: ['dist/**', 'node_modules/**', 'test/artifacts/**', '**/*.d.ts'],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: {
      globals: {
        process: 'readonly',
        console: 'readonly',
        Buffer: 'readonly',
        URL: 'readonly',
        setTimeout: 'readonly',
        clearTimeout: 'readonly',
        setInterval: 'readonly',
        clearInterval: 'readonly',
        setImmediate: 'readonly',
        TextEncoder: 'readonly',
        TextDecoder: 'readonly',
        AbortController: 'readonly',
        AbortSignal: 'readonly',
        fetch: 'readonly',
        structuredClone: 'readonly',
        performance: 'readonly',
        queueMicrotask: 'readonly',
        __dirname: 'readonly',
        require: 'readonly',
        module: 'writable',
        globalThis: 'readonly',
        document: 'readonly',
        window: 'readonly',
      },
    },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
    },
  },
  {
    // Escaping code and its tests name control characters on purpose.
    rules: { 'no-control-regex': 'off' },
  },
  {
    // Reference values are quoted with all the digits their source publishes.
    files: ['test/**', 'src/model/special/**'],
    rules: { 'no-loss-of-precision': 'off' },
  },
  {
    files: ['**/*.cjs'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  prettier,
);
