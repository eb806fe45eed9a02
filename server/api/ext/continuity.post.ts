import { externalContinuitySchema } from '#shared/schemas/joints'
import { continuityByKey } from '../../database/api-tokens'

/** POST /api/ext/continuity: another shop system logs one continuity use by stamp (bearer token with continuity:write) */
export default defineEventHandler(async (event) => {
  const { token, user } = await requireToken(event, 'continuity:write')
  const input = await validBody(event, externalContinuitySchema)
  const answer = orThrow(await continuityByKey(await useDb(), token, user, input, todayIso()))
  setResponseStatus(event, 201)
  return answer
})
