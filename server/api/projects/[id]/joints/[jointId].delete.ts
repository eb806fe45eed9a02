import { jointParamsSchema } from '#shared/schemas/joints'
import { deleteJoint } from '../../../../database/joints'

/** DELETE /api/projects/:id/joints/:jointId: remove an open joint entered by mistake (quality manager; welded joints stay) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  return orThrow(await deleteJoint(await useDb(), user, id, jointId))
})
