import { jointParamsSchema, jointPatchSchema } from '#shared/schemas/joints'
import { updateJoint } from '../../../../database/joints'

/** PATCH /api/projects/:id/joints/:jointId: edit an open joint; the assignment is checked again (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  const input = await validBody(event, jointPatchSchema)
  return orThrow(await updateJoint(await useDb(), user, id, jointId, input, todayIso()))
})
