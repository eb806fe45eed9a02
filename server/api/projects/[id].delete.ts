import { idParamSchema } from '#shared/schemas/list'
import { deleteProject } from '../../database/projects'

/** DELETE /api/projects/:id: the project with its links, grants and packets; the records themselves stay (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await deleteProject(await useDb(), id, user.id))
})
