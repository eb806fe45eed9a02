import withNuxt from './.nuxt/eslint.config.mjs'

export default withNuxt(
  { ignores: ['.data/**', '.data-*/**', 'server/database/migrations/**', 'test-results/**', 'playwright-report/**'] },
  {
    files: ['**/*.ts', '**/*.vue'],
    rules: {
      '@typescript-eslint/consistent-type-imports': ['error', { prefer: 'type-imports', fixStyle: 'inline-type-imports' }],
    },
  },
)
