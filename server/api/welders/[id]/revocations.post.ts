import { revokeQualification } from '../../../database/revocations'
import { idParamSchema } from '#shared/schemas/list'
import { revocationSchema } from '#shared/schemas/revocation'

/** POST /api/welders/:id/revocations: the inspector revokes one process qualification for a specific reason (QW-322.1(b)) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, revocationSchema)
  const row = orThrow(await revokeQualification(await useDb(), user, id, input, appUrl(event)))
  setResponseStatus(event, 201)
  return row
})
