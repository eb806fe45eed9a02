import { sql } from 'drizzle-orm'

/** GET /api/health: public; answers once the database is open and migrated */
export default defineEventHandler(async () => {
  const { db, driver } = await useDatabase()
  await db.execute(sql`select 1`)
  return { ok: true, driver }
})
