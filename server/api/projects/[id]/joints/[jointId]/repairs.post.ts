import { jointParamsSchema, jointRepairSchema } from '#shared/schemas/joints'
import { addRepair } from '../../../../../database/joints'

/** POST /api/projects/:id/joints/:jointId/repairs: a repair (R1, R2...) with its repair welders, each checked on the repair date */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  const input = await validBody(event, jointRepairSchema)
  const row = orThrow(await addRepair(await useDb(), user, id, jointId, input, todayIso()))
  setResponseStatus(event, 201)
  return row
})
