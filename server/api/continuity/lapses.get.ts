import { addDays, format, subDays } from 'date-fns'
import { z } from 'zod'
import { lapsesBetween } from '../../database/standings'

const querySchema = z.object({
  days: z.coerce.number().int().min(1).max(366).default(30),
  // Also list what lapsed in the last `pastDays` days (0: only what is still to lapse)
  pastDays: z.coerce.number().int().min(0).max(3660).default(0),
})

/** GET /api/continuity/lapses: active welders' qualifications that lapse in the next `days` days, soonest first (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  const query = await validQuery(event, querySchema)
  const now = new Date()
  const today = format(now, 'yyyy-MM-dd')
  const from = format(subDays(now, query.pastDays), 'yyyy-MM-dd')
  const rows = await lapsesBetween(await useDb(), query.pastDays ? from : format(addDays(now, 1), 'yyyy-MM-dd'), format(addDays(now, query.days), 'yyyy-MM-dd'), today)
  return { today, days: query.days, rows }
})
