import { listProjects } from '../../database/projects'

/** GET /api/projects: every project for the quality manager; an auditor sees only the projects granted to them */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  return listProjects(await useDb(), user)
})
