import { listFillerMetals } from '../../../database/catalogue'

/** GET /api/catalogue/filler-metals: the filler metals the forms pick from (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  return listFillerMetals(await useDb())
})
