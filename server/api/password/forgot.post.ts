import { and, eq, sql } from 'drizzle-orm'
import { accounts, mailMessages } from '../../database/schema'
import { forgotPasswordSchema } from '#shared/schemas/password'

// At most one reset e-mail per account in each ten-minute window.
const windowMinutes = 10

/** POST /api/password/forgot {email}: e-mail a reset link if an active account has this address; the answer is the same either way (public) */
export default defineEventHandler(async (event) => {
  const { email } = await validBody(event, forgotPasswordSchema)
  const db = await useDb()
  const base = appUrl(event)
  // The work happens after the answer, so neither the answer nor its timing tells whether the address has an account.
  const work = requestReset(db, email.toLowerCase(), base).catch((error: unknown) => console.error('[rootface] password reset failed', error))
  event.waitUntil?.(work)
  setResponseStatus(event, 202)
  return { message: 'If an active account has this address, a link to choose a new password is on its way. It works for one hour.' }
})

async function requestReset(db: Awaited<ReturnType<typeof useDb>>, email: string, base: string) {
  const [account] = await db.select({ id: accounts.id, name: accounts.name, email: accounts.email }).from(accounts)
    .where(and(eq(sql`lower(${accounts.email})`, email), eq(accounts.active, true))).limit(1)
  if (!account) return
  const dedupeKey = `password-reset:${account.id}:${Math.floor(Date.now() / (windowMinutes * 60_000))}`
  const [already] = await db.select({ id: mailMessages.id }).from(mailMessages).where(eq(mailMessages.dedupeKey, dedupeKey)).limit(1)
  if (already) return
  const shopName = await shopNameOf(db)
  await db.transaction(async (tx) => {
    const link = await issueAccountLink(tx, account.id, 'password-reset')
    const queued = await queueMail(tx, passwordResetMail({ dedupeKey, to: account.email, name: account.name, link: setPasswordUrl(base, link.token), expiresAt: link.expiresAt, shopName }))
    if (!queued) throw new Error('a reset for this account was queued a moment ago') // rolls the new link back
    await recordAudit(tx, { accountId: null, action: 'request-password-reset', recordType: 'account', recordId: account.id })
  })
  await sendQueuedMail(db)
}
