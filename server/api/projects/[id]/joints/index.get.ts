import { idParamSchema } from '#shared/schemas/list'
import { jointListQuerySchema } from '#shared/schemas/joints'
import { listJoints } from '../../../../database/joints'

/** GET /api/projects/:id/joints: the project's weld register, paged, sorted and filtered (auditors only granted projects) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const query = await validQuery(event, jointListQuerySchema)
  return orThrow(await listJoints(await useDb(), user, id, query))
})
