import { idParamSchema } from '#shared/schemas/list'
import { versionBodySchema } from '#shared/schemas/fields'
import { reviseProcedure } from '../../../database/procedure-writes'

/** POST /api/procedures/:id/revise: copy an approved WPS into a draft at the next revision (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { version } = await validBody(event, versionBodySchema)
  const draft = orThrow(await reviseProcedure(await useDb(), id, version, user))
  setResponseStatus(event, 201)
  return { id: draft.id, number: draft.number, revision: draft.revision, status: draft.status, version: draft.version }
})
