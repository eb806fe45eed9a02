import { defineConfig } from 'drizzle-kit'

// Only migrate/push/studio use the connection; `generate` needs just the schema.
const url = process.env.DATABASE_URL

export default defineConfig({
  dialect: 'postgresql',
  schema: './server/database/schema.ts',
  out: './server/database/migrations',
  ...(url
    ? { dbCredentials: { url } }
    : { driver: 'pglite', dbCredentials: { url: process.env.NUXT_DATA_DIR ?? './.data/db' } }),
})
