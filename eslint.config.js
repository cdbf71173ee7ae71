import pluginVue from 'eslint-plugin-vue'
import { defineConfigWithVueTs, vueTsConfigs } from '@vue/eslint-config-typescript'
import skipFormatting from 'eslint-config-prettier'
import globals from 'globals'

const OTHER_MODULES_TABLES = {
  group: ['../*/*.entity', '../*/*.repository', '../../*/*.entity', '../../*/*.repository'],
  message: "Go through the other module's service; only a module itself reads its tables.",
}

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
  {
    // A module reaches another module through its service, never through its entities or
    // repositories; the composition root (server/services.ts) is what wires them together.
    files: ['server/modules/**/*.ts'],
    ignores: ['server/modules/**/*.entity.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': ['error', { patterns: [OTHER_MODULES_TABLES] }],
    },
  },
  {
    // An entity names another module's entity in a relation by its class name (a string) and
    // imports it as a type only: the foreign key stays, the import graph does not grow.
    files: ['server/modules/**/*.entity.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { patterns: [{ ...OTHER_MODULES_TABLES, allowTypeImports: true }] },
      ],
    },
  },
  skipFormatting,
)
