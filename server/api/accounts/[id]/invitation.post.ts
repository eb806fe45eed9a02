import { eq } from 'drizzle-orm'
import { accounts } from '../../../database/schema'
import { idParamSchema } from '#shared/schemas/list'

/** POST /api/accounts/:id/invitation: send a new invitation link (the earlier one stops working) to an account without a password (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const [account] = await db.select().from(accounts).where(eq(accounts.id, id)).limit(1)
  if (!account) throw notFound('Account')
  if (!account.active) throw conflict('The account is deactivated: reactivate it first')
  if (account.passwordHash) throw conflict('This account has a password already; its holder can reset it from the sign-in page')
  const base = appUrl(event)
  const shopName = await shopNameOf(db)
  const link = await db.transaction(async (tx) => {
    const issued = await issueAccountLink(tx, id, 'invitation')
    await queueMail(tx, invitationMail({
      tokenId: issued.id, accountId: id, to: account.email, name: account.name, role: account.role, invitedBy: user.name,
      link: setPasswordUrl(base, issued.token), expiresAt: issued.expiresAt, shopName,
    }))
    await recordAudit(tx, { accountId: user.id, action: 'reinvite', recordType: 'account', recordId: id })
    return issued
  })
  sendSoon(db)
  return { id, expiresAt: link.expiresAt }
})
