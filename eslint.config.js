// One lint configuration for every workspace: TypeScript rules everywhere, Vue's rules in the web
// app. Layout is Prettier's (`.prettierrc.json`); eslint-config-prettier switches off the rules
// that would fight it, and the Vue template rules that Prettier leaves alone stay on.
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import vue from 'eslint-plugin-vue';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/.data/**', '**/components.d.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...vue.configs['flat/recommended'],
  {
    files: ['**/*.vue'],
    languageOptions: { parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.vue'] } },
  },
  prettier,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // Template attributes: a fixed order, and self-closing tags written the way Prettier prints them.
      'vue/attributes-order': ['error', { alphabetical: false }],
      'vue/html-self-closing': [
        'error',
        { html: { void: 'always', normal: 'always', component: 'always' }, svg: 'always', math: 'always' },
      ],
      'vue/attribute-hyphenation': 'error',
      'vue/v-on-event-hyphenation': ['error', 'always', { autofix: true }],
      'vue/no-multiple-template-root': 'off',
    },
  },
);
