import { defineConfig, devices } from '@playwright/test'

const port = Number(process.env.E2E_PORT ?? 3217)
const dataRoot = `${process.cwd()}/.data-e2e-${port}`
const output = process.env.NUXT_OUTPUT_DIR || '.output'

export default defineConfig({
  testDir: './e2e',
  workers: 1,
  timeout: 30_000,
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    trace: 'off',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
    },
  },
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'], channel: undefined } }],
  webServer: {
    // The built server on its own port and a fresh data directory, seeded with the demo shop.
    command: `rm -rf ${dataRoot} && node ${output}/server/index.mjs`,
    url: `http://127.0.0.1:${port}/api/health`,
    reuseExistingServer: false,
    // A busy machine seeds the demo shop slowly: E2E_SERVER_TIMEOUT (ms) gives it longer.
    timeout: Number(process.env.E2E_SERVER_TIMEOUT ?? 60_000),
    env: {
      PORT: String(port), HOST: '127.0.0.1', NUXT_DATA_DIR: `${dataRoot}/db`, DATABASE_URL: '',
      AUTH_ORIGIN: `http://127.0.0.1:${port}/api/auth`, AUTH_SECRET: 'e2e-secret-for-rootface-browser-tests',
      // No SMTP server here: mail stays in the outbox, whose one-time links the browser tests read.
      NUXT_MAIL_SHOW_LINKS: 'true',
      // The browser tests sign in as the demo accounts.
      NUXT_SEED_DEMO: 'true',
    },
  },
})
