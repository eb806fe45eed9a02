import { projectSchema } from '#shared/schemas/project'
import { createProject } from '../../database/projects'

/** POST /api/projects: a new project for a customer (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const body = await validBody(event, projectSchema)
  const row = orThrow(await createProject(await useDb(), body, user.id))
  setResponseStatus(event, 201)
  return row
})
