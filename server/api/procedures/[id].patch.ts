import { idParamSchema } from '#shared/schemas/list'
import { procedurePatchSchema } from '#shared/schemas/procedure'
import { updateDraft } from '../../database/procedure-writes'

/** PATCH /api/procedures/:id: save a draft (supervisor); 409 when it is signed or the version is stale */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, procedurePatchSchema)
  const row = orThrow(await updateDraft(await useDb(), id, patch, user))
  return { id: row.id, number: row.number, revision: row.revision, status: row.status, version: row.version }
})
