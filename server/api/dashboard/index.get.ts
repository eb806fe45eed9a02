import { dashboard } from '../../database/standings'

/** GET /api/dashboard: who lapses in the next 30/60/90 days, who has lapsed, every lapse date for the timeline, tests awaiting certification */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  return dashboard(await useDb(), todayIso())
})
