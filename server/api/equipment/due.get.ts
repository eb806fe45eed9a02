import { calibrationsDue } from '../../database/equipment'

/** GET /api/equipment/due: in-service machines and meters due for calibration within 30 days, past due, or without a date */
export default defineEventHandler(async (event) => {
  await requireRole(event, staff)
  return calibrationsDue(await useDb(), todayIso())
})
