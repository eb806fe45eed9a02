import { eq, sql } from 'drizzle-orm'
import { accounts } from '../../database/schema'
import { accountInviteSchema } from '#shared/schemas/account'

/** POST /api/accounts {email, name, role, welderId?}: open an account and e-mail its holder a one-time link to choose a password (supervisor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const body = await validBody(event, accountInviteSchema)
  const db = await useDb()
  const email = body.email.toLowerCase()
  const [taken] = await db.select({ id: accounts.id }).from(accounts).where(eq(sql`lower(${accounts.email})`, email)).limit(1)
  if (taken) throw fieldConflict('email', 'An account with this e-mail address exists already')
  if (body.welderId) await assertLinkableWelder(db, body.welderId)

  const base = appUrl(event)
  const shopName = await shopNameOf(db)
  const account = await db.transaction(async (tx) => {
    const [created] = await tx.insert(accounts).values({ email, name: body.name, role: body.role, welderId: body.welderId ?? null }).returning()
    const link = await issueAccountLink(tx, created!.id, 'invitation')
    await queueMail(tx, invitationMail({
      tokenId: link.id, accountId: created!.id, to: email, name: body.name, role: body.role, invitedBy: user.name,
      link: setPasswordUrl(base, link.token), expiresAt: link.expiresAt, shopName,
    }))
    await recordAudit(tx, { accountId: user.id, action: 'invite', recordType: 'account', recordId: created!.id, after: { email, name: body.name, role: body.role, welderId: body.welderId ?? null } })
    return created!
  })
  sendSoon(db)
  setResponseStatus(event, 201)
  return { id: account.id, email: account.email, name: account.name, role: account.role, welderId: account.welderId, state: 'invited' as const }
})
