import { revocationsOf } from '../../../database/revocations'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/welders/:id/revocations: a welder's revoked qualifications with reason, who and when; a welder reads only their own (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await revocationsOf(await useDb(), user, id))
})
