import { registerProjects } from '../../database/joints'

/** GET /api/registers: the projects whose weld registers the reader may open, with joint counts (auditors only granted ones) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'auditor'])
  return registerProjects(await useDb(), user)
})
