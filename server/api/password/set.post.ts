import bcrypt from 'bcryptjs'
import { and, eq, gt, isNull, ne, sql } from 'drizzle-orm'
import { accountTokens, accounts } from '../../database/schema'
import { setPasswordSchema } from '#shared/schemas/password'

/** POST /api/password/set {token, password, confirm}: choose a password with a one-time link (public; the link works once) */
export default defineEventHandler(async (event) => {
  const body = await validBody(event, setPasswordSchema)
  const db = await useDb()
  const state = await accountLinkState(db, body.token)
  if (!state.ok) throw linkProblem(state.reason)
  const passwordHash = await bcrypt.hash(body.password, 10)
  const done = await db.transaction(async (tx) => {
    // Claim the link in the same statement that checks it, so two requests with one link cannot both succeed.
    const [claimed] = await tx.update(accountTokens).set({ usedAt: sql`now()` })
      .where(and(eq(accountTokens.id, state.tokenId), isNull(accountTokens.usedAt), gt(accountTokens.expiresAt, sql`now()`)))
      .returning({ id: accountTokens.id })
    if (!claimed) return false
    await tx.update(accounts).set({ passwordHash }).where(eq(accounts.id, state.account.id))
    // A new password ends every session of the account.
    await endSessions(tx, state.account.id)
    // Any other open link of the account stops working once a password is chosen.
    await tx.delete(accountTokens).where(and(eq(accountTokens.accountId, state.account.id), isNull(accountTokens.usedAt), ne(accountTokens.id, claimed.id)))
    await recordAudit(tx, { accountId: state.account.id, action: state.purpose === 'invitation' ? 'accept-invitation' : 'reset-password', recordType: 'account', recordId: state.account.id })
    return true
  })
  if (!done) throw linkProblem('used')
  return { email: state.account.email }
})
