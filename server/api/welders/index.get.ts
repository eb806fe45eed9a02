import { listWelders } from '../../database/welders'
import { welderListQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/welders: the roster, paged, sorted and filtered (supervisor, inspector) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, welderListQuerySchema)
  return listWelders(await useDb(), query)
})
