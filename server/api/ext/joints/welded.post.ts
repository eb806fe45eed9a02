import { externalWeldedSchema } from '#shared/schemas/joints'
import { auditTokenUse } from '../../../database/api-tokens'
import { weldedFromSystem } from '../../../database/joints'
import { isFailure } from '#shared/types/outcome'

/** POST /api/ext/joints/welded: another shop system reports a joint welded (bearer token with joints:write); checked and posted as by hand */
export default defineEventHandler(async (event) => {
  const { token, user } = await requireToken(event, 'joints:write')
  const input = await validBody(event, externalWeldedSchema)
  const db = await useDb()
  const result = await weldedFromSystem(db, user, input, todayIso())
  await auditTokenUse(db, token, 'joint-welded', isFailure(result) ? { refused: result.fail, project: input.project, mark: input.mark } : { jointId: result.id, posted: result.posted })
  return orThrow(result)
})
