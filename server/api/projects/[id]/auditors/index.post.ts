import { idParamSchema } from '#shared/schemas/list'
import { grantAuditorSchema } from '#shared/schemas/project'
import { attach } from '../../../../database/projects'

/** POST /api/projects/:id/auditors: grant an auditor account access to the project (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { accountId } = await validBody(event, grantAuditorSchema)
  return orThrow(await attach(await useDb(), id, 'auditor', accountId, user.id))
})
