import { idParamSchema } from '#shared/schemas/list'
import { grantAuditorSchema } from '#shared/schemas/project'
import { attach } from '../../../../database/projects'
import { invalidField } from '../../../../sheets/errors'

/** POST /api/projects/:id/auditors: grant an auditor account access to the project (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { accountId } = await validBody(event, grantAuditorSchema)
  const result = await attach(await useDb(), id, 'auditor', accountId, user.id)
  if ('ok' in result) return { ok: true }
  if (result.error === 'project') throw notFound('Project')
  throw invalidField('accountId', result.error === 'draft' ? 'A draft WPS cannot go into a packet; approve it first' : 'Choose an active auditor account')
})
