import { externalWeldedSchema } from '#shared/schemas/joints'
import { weldedByKey } from '../../../database/joints'

/** POST /api/ext/joints/welded: another shop system reports a joint welded (bearer token with joints:write); checked and posted as by hand */
export default defineEventHandler(async (event) => {
  const { token, user } = await requireToken(event, 'joints:write')
  const input = await validBody(event, externalWeldedSchema)
  return orThrow(await weldedByKey(await useDb(), token, user, input, todayIso()))
})
