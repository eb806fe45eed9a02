import { logEntry, mayLogContinuity } from '../../database/continuity'
import { continuityEntrySchema } from '#shared/schemas/continuity-entry'

/** POST /api/continuity: one entry; staff for anyone, a welder for themselves only if the shop allows it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const db = await useDb()
  orThrow(await mayLogContinuity(db, user))
  const input = await validBody(event, continuityEntrySchema)
  const logged = orThrow(await logEntry(db, user, input, todayIso()))
  setResponseStatus(event, 201)
  return logged
})
