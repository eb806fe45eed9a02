import { idParamSchema } from '#shared/schemas/list'
import { versionBodySchema } from '#shared/schemas/fields'
import { discardDraft } from '../../database/procedure-writes'

/** DELETE /api/procedures/:id: discard an unsigned draft (supervisor); 409 for a signed revision or a stale version */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { version } = await validBody(event, versionBodySchema)
  const row = orThrow(await discardDraft(await useDb(), id, version, user))
  return { id: row.id, number: row.number, revision: row.revision, discarded: true }
})
