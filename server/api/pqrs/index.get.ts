import { listPqrs } from '../../database/pqrs'
import { pqrListQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/pqrs: PQR list with what the support check needs of each (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, pqrListQuerySchema)
  return listPqrs(await useDb(), query)
})
