import { externalContinuitySchema } from '#shared/schemas/joints'
import { auditTokenUse, continuityFromSystem } from '../../database/api-tokens'
import { isFailure } from '#shared/types/outcome'

/** POST /api/ext/continuity: another shop system logs one continuity use by stamp (bearer token with continuity:write) */
export default defineEventHandler(async (event) => {
  const { token, user } = await requireToken(event, 'continuity:write')
  const input = await validBody(event, externalContinuitySchema)
  const db = await useDb()
  const result = await continuityFromSystem(db, user, input, todayIso())
  await auditTokenUse(db, token, 'continuity', isFailure(result) ? { refused: result.fail, stamp: input.stamp } : { stamp: input.stamp, process: input.process, weldedOn: input.weldedOn })
  setResponseStatus(event, isFailure(result) ? 400 : 201)
  return orThrow(result)
})
