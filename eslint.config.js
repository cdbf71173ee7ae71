import pluginVue from 'eslint-plugin-vue'
import { defineConfigWithVueTs, vueTsConfigs } from '@vue/eslint-config-typescript'
import skipFormatting from 'eslint-config-prettier'
import globals from 'globals'

export default defineConfigWithVueTs(
  { ignores: ['dist/**', '.local/**', 'node_modules/**'] },
  pluginVue.configs['flat/recommended'],
  vueTsConfigs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      // Prettier lays out attributes; this layout rule disagrees with it.
      'vue/first-attribute-linebreak': 'off',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['shared/dynamics/**/*.ts', 'shared/measurements/**/*.ts', 'shared/updating/**/*.ts'],
    rules: {
      'no-restricted-properties': [
        'error',
        {
          object: 'Math',
          property: 'random',
          message: 'The engine is pure: inject a seeded generator.',
        },
        { object: 'Date', property: 'now', message: 'The engine is pure: pass times in.' },
      ],
    },
  },
  skipFormatting,
)
