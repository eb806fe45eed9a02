import { insertEntries, missingWelders } from '../../database/continuity'
import { continuityBulkSchema } from '#shared/schemas/continuity'

/** POST /api/continuity/bulk: one process and date for many welders, all stored or none (supervisor, inspector) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const input = await validBody(event, continuityBulkSchema)
  if (input.weldedOn > todayIso()) throw httpError(fieldFailure('weldedOn', 'The date is after today'))
  const db = await useDb()
  const missing = await missingWelders(db, input.welderIds)
  if (missing.length) throw httpError(fieldFailure('welderIds', `Not on the roster: ${missing.join(', ')}`))
  const stored = await insertEntries(db, input.welderIds.map(welderId => ({ welderId, process: input.process, weldedOn: input.weldedOn, reference: input.reference })), user.id, 'bulk')
  setResponseStatus(event, 201)
  return { stored }
})
