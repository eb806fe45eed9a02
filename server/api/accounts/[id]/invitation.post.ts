import { reinviteAccount } from '../../../database/accounts'
import { idParamSchema } from '#shared/schemas/list'

/** POST /api/accounts/:id/invitation: send a new invitation link (the earlier one stops working) to an account without a password (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const sent = orThrow(await reinviteAccount(db, user, id, appUrl(event)))
  sendSoon(db)
  return sent
})
