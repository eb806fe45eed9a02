import { isoValidityOfTest } from '../../../database/iso-validity'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/tests/:id/iso-validity: an ISO 9606-1 test's designation, 9.2 confirmations and 9.3 expiry (404 for another code or a record the user may not read) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await isoValidityOfTest(await useDb(), user, id, todayIso()))
})
