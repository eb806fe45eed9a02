import { findAccount } from '../../database/accounts'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/accounts/:id: one account (supervisor) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await findAccount(await useDb(), id))
})
