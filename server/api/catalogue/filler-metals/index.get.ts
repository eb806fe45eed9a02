import { asc } from 'drizzle-orm'
import { fillerMetals } from '../../../database/schema'

/** GET /api/catalogue/filler-metals: the filler metals the forms pick from (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const db = await useDb()
  return db.select().from(fillerMetals).orderBy(asc(fillerMetals.fNumber), asc(fillerMetals.specification), asc(fillerMetals.classification))
})
