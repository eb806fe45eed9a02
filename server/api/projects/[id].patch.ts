import { idParamSchema } from '#shared/schemas/list'
import { projectPatchSchema } from '#shared/schemas/project'
import { updateProject } from '../../database/projects'

/** PATCH /api/projects/:id: change number, name, customer or period (quality manager); a stale version is a 409 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const body = await validBody(event, projectPatchSchema)
  return orThrow(await updateProject(await useDb(), id, body, user.id))
})
