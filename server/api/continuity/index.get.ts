import { listEntries } from '../../database/continuity'
import { continuityListQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/continuity: the continuity log; a welder sees only their own entries */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const query = await validQuery(event, continuityListQuerySchema)
  return listEntries(await useDb(), user, query)
})
