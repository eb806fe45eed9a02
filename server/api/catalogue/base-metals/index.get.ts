import { asc } from 'drizzle-orm'
import { baseMetals } from '../../../database/schema'

/** GET /api/catalogue/base-metals: the base metals the forms pick from (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const db = await useDb()
  return db.select().from(baseMetals).orderBy(asc(baseMetals.pNumber), asc(baseMetals.specification), asc(baseMetals.grade))
})
