import { updateWelder } from '../../database/welders'
import { idParamSchema } from '#shared/schemas/list'
import { welderPatchSchema } from '#shared/schemas/welder'

/** PATCH /api/welders/:id: the quality manager edits a roster entry (409 when stale) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const patch = await validBody(event, welderPatchSchema)
  return orThrow(await updateWelder(await useDb(), id, patch, user.id))
})
