import { insertEntries, missingWelders, welderLogsOwnContinuity } from '../../database/continuity'
import { continuityEntrySchema } from '#shared/schemas/continuity'

/** POST /api/continuity: one entry; staff for anyone, a welder for themselves only if the shop allows it */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const db = await useDb()
  if (user.role === 'welder' && !await welderLogsOwnContinuity(db)) {
    throw createError({ statusCode: 403, statusMessage: 'Your shop has continuity logged by the inspector or the quality manager' })
  }
  const input = await validBody(event, continuityEntrySchema)
  if (user.role === 'welder' && input.welderId !== user.welderId) throw httpError(missing('Welder'))
  if (input.weldedOn > todayIso()) throw httpError(fieldFailure('weldedOn', 'The date is after today'))
  if ((await missingWelders(db, [input.welderId])).length) throw httpError(fieldFailure('welderId', 'No such welder on the roster'))
  await insertEntries(db, [input], user.id, 'create')
  setResponseStatus(event, 201)
  const standings = (await standingsOfWelders(db, [input.welderId])).get(input.welderId) ?? []
  return { stored: 1, standings }
})
