import { procedureDraftSchema } from '#shared/schemas/procedure'
import { createDraft } from '../../database/procedure-writes'

/** POST /api/procedures: a new WPS, as a draft at revision 0 (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const draft = await validBody(event, procedureDraftSchema)
  const row = orThrow(await createDraft(await useDb(), draft, user))
  setResponseStatus(event, 201)
  return { id: row.id, number: row.number, revision: row.revision, status: row.status, version: row.version }
})
