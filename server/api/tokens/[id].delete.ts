import { idParamSchema } from '#shared/schemas/list'
import { revokeApiToken } from '../../database/api-tokens'

/** DELETE /api/tokens/:id: revoke an API token; it stops working at once (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await revokeApiToken(await useDb(), user, id))
})
