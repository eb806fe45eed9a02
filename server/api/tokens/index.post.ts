import { apiTokenSchema } from '#shared/schemas/joints'
import { createApiToken } from '../../database/api-tokens'

/** POST /api/tokens: a new API token for another shop system, shown once (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const input = await validBody(event, apiTokenSchema)
  const created = await createApiToken(await useDb(), user, input)
  setResponseStatus(event, 201)
  return created
})
