import { ping } from '../../database/admin'

/** GET /api/health: public; answers once the database is open and migrated */
export default defineEventHandler(async () => {
  const { db, driver } = await useDatabase()
  await ping(db)
  return { ok: true, driver }
})
