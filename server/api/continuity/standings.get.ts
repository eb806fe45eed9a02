import { standingsBoard } from '../../database/standings'
import { standingsQuerySchema } from '#shared/schemas/list-queries'

/** GET /api/continuity/standings: each active welder × process, soonest lapse first (the first `limit`, with the total): last use, lapse date, days left, how to renew (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, standingsQuerySchema)
  return standingsBoard(await useDb(), query, todayIso())
})
