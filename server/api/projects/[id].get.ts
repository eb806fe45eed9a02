import { idParamSchema } from '#shared/schemas/list'
import { projectPage } from '../../database/projects'

/** GET /api/projects/:id: the project, its WPSs, welders, auditors and who was not current in its period; auditors only granted ones */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await projectPage(await useDb(), user, id))
})
