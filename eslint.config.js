// ESLint flat config: the JavaScript and typescript-eslint recommended rules; layout is prettier's (.prettierrc.json).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'coverage/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { ecmaVersion: 2022, sourceType: 'module', globals: { process: 'readonly', console: 'readonly', URL: 'readonly' } },
    rules: {
      // Unused names are mistakes, except a deliberately ignored argument or destructured rest (_name).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', ignoreRestSiblings: true }],
      // Type-only imports stay type-only, so a picture writer never loads the solver to name one of its types.
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      eqeqeq: ['error', 'always'],
      'no-console': 'error',
      'prefer-const': 'error',
      // zod as a namespace (import * as z): a named `z` import is one object holding all of zod, which the bundler
      // must keep whole (locales and all), about 30 ms more on every scenario read.
      'no-restricted-syntax': [
        'error',
        {
          selector: "ImportDeclaration[source.value='zod'] > ImportSpecifier[imported.name='z']",
          message: "import * as z from 'zod', so that the bundle keeps only the parts used",
        },
      ],
    },
  },
  {
    files: ['test/**', 'bin/**', '*.js', '*.mjs'],
    rules: { 'no-console': 'off' },
  },
  // bin/ is CommonJS (bin/package.json): the command's entry point skips Node's ES module loader.
  {
    files: ['bin/**/*.js'],
    languageOptions: { sourceType: 'commonjs', globals: { require: 'readonly', module: 'writable', __dirname: 'readonly' } },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
);
