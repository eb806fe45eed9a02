import { jointParamsSchema } from '#shared/schemas/joints'
import { jointPage } from '../../../../database/joints'

/** GET /api/projects/:id/joints/:jointId: one joint with its welders, repairs, examinations, overrides and posted continuity */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'auditor'])
  const { id, jointId } = await validParams(event, jointParamsSchema)
  return orThrow(await jointPage(await useDb(), user, id, jointId))
})
