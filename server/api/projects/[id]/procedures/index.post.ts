import { idParamSchema } from '#shared/schemas/list'
import { attachProcedureSchema } from '#shared/schemas/project'
import { attach } from '../../../../database/projects'

/** POST /api/projects/:id/procedures: attach a procedure to the project (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { procedureId } = await validBody(event, attachProcedureSchema)
  return orThrow(await attach(await useDb(), id, 'procedure', procedureId, user.id))
})
