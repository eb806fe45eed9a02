import { removeEntry } from '../../database/continuity'
import { idParamSchema } from '#shared/schemas/list'

/** DELETE /api/continuity/:id: the quality manager removes an entry logged by mistake (kept in the audit trail) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  orThrow(await removeEntry(await useDb(), user, id))
  setResponseStatus(event, 204)
  return null
})
