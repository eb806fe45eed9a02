import { rejectBoard } from '../../database/joints'

/** GET /api/dashboard/rejects: every examined welder's reject rate and trend, flagged (rising) first (staff) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor', 'inspector'])
  return rejectBoard(await useDb(), todayIso())
})
