import { idParamSchema } from '#shared/schemas/list'
import { jointSchema } from '#shared/schemas/joints'
import { createJoint } from '../../../../database/joints'

/** POST /api/projects/:id/joints: a new joint; an assignment the check refuses is a 422 with reasons unless overridden in writing (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, jointSchema)
  const row = orThrow(await createJoint(await useDb(), user, id, input, todayIso()))
  setResponseStatus(event, 201)
  return row
})
