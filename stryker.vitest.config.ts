// Vitest config used only by mutation testing (npm run test:mutation): the unit tests of the rules.
import { defineConfig } from 'vitest/config'
import { fileURLToPath } from 'node:url'

export default defineConfig({
  // The sandbox has no .nuxt folder, so do not let esbuild read tsconfig.json (it extends .nuxt/...).
  esbuild: { tsconfigRaw: '{}' },
  resolve: { alias: { '#shared': fileURLToPath(new URL('./shared', import.meta.url)) } },
  // Property tests need more than vitest's 5 s when the shared machine is busy; a timed-out test stops the whole run.
  test: { include: ['tests/unit/shared/**/*.test.ts'], environment: 'node', testTimeout: 60_000 },
})
