import { jointParamsSchema, jointWeldedSchema } from '#shared/schemas/joints'
import { markWelded } from '../../../../../database/joints'

/** POST /api/projects/:id/joints/:jointId/welded: mark the joint welded on a day; checked on that day, then continuity is posted per welder and process */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  const input = await validBody(event, jointWeldedSchema)
  return orThrow(await markWelded(await useDb(), user, id, jointId, input, todayIso()))
})
