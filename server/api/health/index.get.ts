import { sql } from 'drizzle-orm'

/**
 * GET /api/health: public; answers once the database is open and migrated. A PostgreSQL server is asked `select 1`;
 * the embedded database lives in this process and has one connection, so asking it would wait behind any long
 * transaction (a large import) and say nothing more than that this process answers.
 */
export default defineEventHandler(async () => {
  const { db, driver } = await useDatabase()
  if (driver === 'postgres') await db.execute(sql`select 1`)
  return { ok: true, driver }
})
