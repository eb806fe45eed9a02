import { cp } from 'node:fs/promises'
import { fileURLToPath } from 'node:url'
import { join } from 'node:path'

const rootDir = fileURLToPath(new URL('.', import.meta.url))

export default defineNuxtConfig({
  modules: ['@nuxtjs/tailwindcss', '@pinia/nuxt', '@sidebase/nuxt-auth', '@nuxt/eslint'],
  devtools: { enabled: false },
  app: {
    head: {
      htmlAttrs: { lang: 'en' },
      title: 'Rootface',
      meta: [
        { name: 'viewport', content: 'width=device-width, initial-scale=1' },
        { name: 'description', content: 'Welding procedures, welder qualifications and continuity for code shops.' },
      ],
    },
  },
  css: ['@fontsource/source-sans-3/400.css', '@fontsource/source-sans-3/600.css', '@fontsource/source-sans-3/700.css', '~/assets/css/main.css'],
  runtimeConfig: {
    // NUXT_DATA_DIR: where PGlite keeps its files (ignored when DATABASE_URL is set)
    dataDir: join(rootDir, '.data/db'),
    // DATABASE_URL (read at run time) switches to a PostgreSQL server
    databaseUrl: '',
    // AUTH_SECRET (read at run time) signs the session tokens; set it in production
    authSecret: 'rootface-development-secret-change-me',
    // NUXT_SEED_DEMO=false keeps an empty database empty
    seedDemo: true,
    public: { shopName: 'Rootface demo shop' },
  },
  dir: { shared: 'shared', public: 'public' },
  srcDir: '.',
  serverDir: 'server',
  // Separate build and output folders let several builds run side by side (tests, benchmarks).
  buildDir: process.env.NUXT_BUILD_DIR || '.nuxt',
  compatibilityDate: '2026-11-01',
  nitro: {
    output: { dir: process.env.NUXT_OUTPUT_DIR || '.output' },
    experimental: { tasks: true },
    hooks: {
      // The built server reads its migrations from beside its entry file.
      async compiled(nitro) {
        await cp(join(rootDir, 'server/database/migrations'), join(nitro.options.output.serverDir, 'migrations'), { recursive: true })
      },
    },
  },
  typescript: { strict: true },
  telemetry: false,
  auth: {
    baseURL: '/api/auth',
    originEnvKey: 'AUTH_ORIGIN',
    provider: { type: 'authjs', defaultProvider: undefined, addDefaultCallbackUrl: false },
    globalAppMiddleware: true,
    sessionRefresh: { enablePeriodically: false, enableOnWindowFocus: false },
  },
  eslint: { config: { stylistic: true } },
  tailwindcss: { cssPath: false, viewer: false },
})
