import { inviteAccount } from '../../database/accounts'
import { accountInviteSchema } from '#shared/schemas/account'

/** POST /api/accounts {email, name, role, welderId?}: open an account and e-mail its holder a one-time link to choose a password (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const body = await validBody(event, accountInviteSchema)
  const db = await useDb()
  const account = orThrow(await inviteAccount(db, user, body, appUrl(event)))
  sendSoon(db)
  setResponseStatus(event, 201)
  return account
})
