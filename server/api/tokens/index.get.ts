import { listApiTokens } from '../../database/api-tokens'

/** GET /api/tokens: the shop's API tokens (name, first characters, scopes, last use, revoked); never the tokens themselves */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  return listApiTokens(await useDb())
})
