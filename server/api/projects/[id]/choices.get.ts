import { idParamSchema } from '#shared/schemas/list'
import { projectChoices } from '../../../database/projects'

/** GET /api/projects/:id/choices: the procedures, welders and auditor accounts that can be attached (quality manager) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  await validParams(event, idParamSchema)
  return projectChoices(await useDb())
})
