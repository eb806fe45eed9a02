import { cp } from 'node:fs/promises'
import { fileURLToPath } from 'node:url'
import { join } from 'node:path'

const rootDir = fileURLToPath(new URL('.', import.meta.url))

export default defineNuxtConfig({
  modules: ['@nuxtjs/tailwindcss', '@pinia/nuxt', '@sidebase/nuxt-auth', '@nuxt/eslint', 'nuxt-security', 'h3-compression/nuxt'],
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
    // AUTH_SECRET (read at run time) signs the session tokens. This default serves development only: a production
    // server refuses to start without an AUTH_SECRET of at least 32 characters (server/plugins/database.ts).
    authSecret: 'rootface-development-secret-change-me',
    // NUXT_SEED_DEMO=true seeds the demo shop into an empty database (`npm run dev` sets it); otherwise it stays empty
    seedDemo: false,
    // NUXT_TRUSTED_PROXIES: comma-separated addresses of reverse proxies whose X-Forwarded-For is believed (sign-in throttling)
    trustedProxies: '',
    // NUXT_FILES_DIR: where uploaded files live on local disk (default: 'files' beside the data directory); S3_* env switches to a bucket
    filesDir: '',
    // NUXT_APP_URL: the public address put in e-mailed links (default: the origin of AUTH_ORIGIN)
    appUrl: '',
    // NUXT_MAIL_TEST_CLOCK=true lets a supervisor run the reminder job for another day (development and tests only)
    mailTestClock: false,
    // NUXT_MAIL_SHOW_LINKS=true shows one-time links in the bodies on the Mail page (development and tests only)
    mailShowLinks: false,
    // NUXT_MAIL_RETRY_SECONDS: wait before the first retry of a failed send (doubling each time, at most an hour)
    mailRetrySeconds: 60,
    // NUXT_INVITATION_HOURS: how long an invitation link works (a password-reset link works one hour)
    invitationHours: 168,
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
    // Static assets are served pre-compressed (gzip and brotli) to browsers that accept it.
    compressPublicAssets: { gzip: true, brotli: true },
    experimental: { tasks: true },
    // exceljs's dependency chain requires these through the "module-sync" export condition, which the tracer does not follow.
    externals: { traceInclude: ['async-function', 'generator-function', 'async-generator-function'].map(p => join(rootDir, 'node_modules', p, 'require.mjs')) },
    // Before every other plugin: a production server without a strong AUTH_SECRET or without AUTH_ORIGIN stops here.
    plugins: [join(rootDir, 'server/startup/production-check.ts')],
    // Lapse reminders and the weekly digest once a day at 06:00; the outbox retries queued mail every minute.
    scheduledTasks: { '0 6 * * *': ['mail:reminders'], '* * * * *': ['mail:send'] },
    // The sheet fonts travel with the server build (read with useStorage('assets:sheet-fonts')).
    serverAssets: [{ baseName: 'sheet-fonts', dir: join(rootDir, 'node_modules/source-sans/TTF'), pattern: 'SourceSans3-{Regular,Semibold,Bold,It}.ttf' }],
    hooks: {
      // The built server reads its migrations from beside its entry file.
      async compiled(nitro) {
        await cp(join(rootDir, 'server/database/migrations'), join(nitro.options.output.serverDir, 'migrations'), { recursive: true })
        // Packets are laid out in a worker thread (server/sheets/packet-render.ts); its bundle sits beside the entry.
        const { build } = await import('esbuild')
        await build({
          entryPoints: [join(rootDir, 'server/sheets/render-worker.ts')], outfile: join(nitro.options.output.serverDir, 'sheet-worker.cjs'),
          bundle: true, platform: 'node', format: 'cjs', target: 'node20', alias: { '#shared': join(rootDir, 'shared') }, logLevel: 'warning',
        })
        // The continuity-import check runs in a worker thread too (server/workers/import-check.ts).
        await build({
          entryPoints: [join(rootDir, 'server/workers/import-worker.ts')], outfile: join(nitro.options.output.serverDir, 'import-worker.cjs'),
          bundle: true, platform: 'node', format: 'cjs', target: 'node20', alias: { '#shared': join(rootDir, 'shared') }, logLevel: 'warning',
        })
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
  // Pages and JSON answers are gzipped when the browser accepts it (static assets are pre-compressed by Nitro).
  // Attachments are PDFs and images, compressed already: served as stored.
  // Binary answers (files, PDFs, archives) are sent as they are.
  compression: { threshold: 1024, exclude: ['/_nuxt', '/__nuxt', '/api/attachments', '/api/sheets', '/api/packets', '/api/admin/backup'] },
  eslint: { config: { stylistic: true } },
  // Security headers (CSP with per-request nonces, no inline scripts), size limits; sign-in slowing is our own.
  security: {
    rateLimiter: false,
    xssValidator: false,
    corsHandler: false,
    requestSizeLimiter: { maxRequestSizeInBytes: 2_000_000, maxUploadFileRequestInBytes: 21_000_000 },
    headers: {
      // Everything from this origin only; inline style attributes (Vue's style bindings) but no style sheet or font
      // from any other origin.
      contentSecurityPolicy: {
        'default-src': ['\'self\''],
        'connect-src': ['\'self\''],
        'style-src': ['\'self\'', '\'unsafe-inline\''],
        'font-src': ['\'self\'', 'data:'],
        'img-src': ['\'self\'', 'data:', 'blob:'],
        'script-src': ['\'self\'', '\'strict-dynamic\'', '\'nonce-{{nonce}}\''],
        'frame-ancestors': ['\'none\''],
        'upgrade-insecure-requests': false,
      },
      crossOriginEmbedderPolicy: false,
    },
  },
  tailwindcss: { cssPath: false, viewer: false },
})
