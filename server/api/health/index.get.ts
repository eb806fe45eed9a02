import { ping } from '../../database/admin'

/**
 * GET /api/health: public; answers once the database is open and migrated. A PostgreSQL server is asked `select 1`;
 * the embedded database lives in this process and has one connection, so asking it would wait behind any long
 * transaction (a large import) and say nothing more than that this process answers.
 */
export default defineEventHandler(async () => {
  const { db, driver } = await useDatabase()
  if (driver === 'postgres') await ping(db)
  return { ok: true, driver }
})
