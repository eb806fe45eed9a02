import { logBulk } from '../../database/continuity'
import { continuityBulkSchema } from '#shared/schemas/continuity-entry'

/** POST /api/continuity/bulk: one process and date for many welders, all stored or none (supervisor, inspector) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const input = await validBody(event, continuityBulkSchema)
  const logged = orThrow(await logBulk(await useDb(), user, input, todayIso()))
  setResponseStatus(event, 201)
  return logged
})
