import { idParamSchema } from '#shared/schemas/list'
import { attachProcedureSchema } from '#shared/schemas/project'
import { attach } from '../../../../database/projects'
import { invalidField } from '../../../../sheets/errors'

/** POST /api/projects/:id/procedures: attach a procedure to the project (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { procedureId } = await validBody(event, attachProcedureSchema)
  const result = await attach(await useDb(), id, 'procedure', procedureId, user.id)
  if ('ok' in result) return { ok: true }
  if (result.error === 'project') throw notFound('Project')
  throw invalidField('procedureId', result.error === 'draft' ? 'A draft WPS cannot go into a packet; approve it first' : 'Choose an existing procedure')
})
