import { listBaseMetals } from '../../../database/catalogue'

/** GET /api/catalogue/base-metals: the base metals the forms pick from (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  return listBaseMetals(await useDb())
})
