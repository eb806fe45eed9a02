import { randomBytes } from 'node:crypto'
import { and, count, eq, ilike, isNull, lte, or, sql } from 'drizzle-orm'
import type { z } from 'zod'
import type { Db } from './client'
import { accountTokens, accounts, mailMessages, shopSettings, welders } from './schema'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import { sendQueuedMail, type OutgoingMail } from '../utils/mail'
import { hashLinkToken, linkLifetimeHours, type LinkPurpose } from '../utils/mail-links'
import { missing } from '../../shared/types/outcome'
import type { mailListQuerySchema } from '../../shared/schemas/mail'

// Every query of mail: the outbox (queue, claim, mark, list, retry), the one-time links e-mail carries, and what the
// reminders read. Sending (SMTP, retry timing) lives in server/utils/mail.ts, the letters in server/utils/mail-messages.ts.

const CLAIM_MINUTES = 5

/** Queues a message unless one with the same dedupe key exists. Returns whether it was queued now. */
export async function queueMail(db: Db, mail: OutgoingMail): Promise<boolean> {
  const rows = await db.insert(mailMessages).values(mail).onConflictDoNothing({ target: mailMessages.dedupeKey }).returning({ id: mailMessages.id })
  return rows.length > 0
}

/** Takes the oldest due message for this sender; another sender (process or server) skips the claimed row. */
export async function claimNextMail(db: Db): Promise<typeof mailMessages.$inferSelect | undefined> {
  const due = db.select({ id: mailMessages.id }).from(mailMessages)
    .where(and(eq(mailMessages.status, 'queued'), or(isNull(mailMessages.notBefore), lte(mailMessages.notBefore, sql`now()`))))
    .orderBy(mailMessages.id).limit(1).for('update', { skipLocked: true })
  const [row] = await db.update(mailMessages)
    .set({ attempts: sql`${mailMessages.attempts} + 1`, notBefore: sql`now() + make_interval(mins => ${CLAIM_MINUTES})` })
    .where(and(eq(mailMessages.status, 'queued'), sql`${mailMessages.id} = (${due})`))
    .returning()
  return row
}

export async function mailSent(db: Db, id: number) {
  await db.update(mailMessages).set({ status: 'sent', sentAt: sql`now()`, lastError: null, notBefore: null }).where(eq(mailMessages.id, id))
}

/** A send failed: try again after `retryInSeconds`, or (null) give up and mark it failed. */
export async function mailSendFailed(db: Db, id: number, lastError: string, retryInSeconds: number | null) {
  await db.update(mailMessages).set({
    status: retryInSeconds === null ? 'failed' : 'queued', lastError,
    notBefore: retryInSeconds === null ? null : sql`now() + make_interval(secs => ${retryInSeconds})`,
  }).where(eq(mailMessages.id, id))
}

/** Queue a failed message again (supervisor, from the mail page). */
export async function requeueMail(db: Db, id: number) {
  const [row] = await db.update(mailMessages).set({ status: 'queued', attempts: 0, notBefore: null })
    .where(and(eq(mailMessages.id, id), eq(mailMessages.status, 'failed'))).returning({ id: mailMessages.id })
  return !!row
}

/** A new link for the account; earlier unused links of the same purpose stop working. Returns the raw token. */
export async function issueAccountLink(db: Db, accountId: number, purpose: LinkPurpose, now = new Date()) {
  const token = randomBytes(32).toString('base64url')
  await db.delete(accountTokens).where(and(eq(accountTokens.accountId, accountId), eq(accountTokens.purpose, purpose), isNull(accountTokens.usedAt)))
  const [row] = await db.insert(accountTokens).values({
    accountId, purpose, tokenHash: hashLinkToken(token),
    expiresAt: new Date(now.getTime() + linkLifetimeHours(purpose) * 3600_000),
  }).returning({ id: accountTokens.id, expiresAt: accountTokens.expiresAt })
  return { token, id: row!.id, expiresAt: row!.expiresAt }
}

export type LinkState
  = | { ok: true, tokenId: number, purpose: LinkPurpose, account: { id: number, email: string, name: string } }
    | { ok: false, reason: 'unknown' | 'used' | 'expired' }

export async function accountLinkState(db: Db, token: string, now = new Date()): Promise<LinkState> {
  const [row] = await db.select({
    id: accountTokens.id, purpose: accountTokens.purpose, expiresAt: accountTokens.expiresAt, usedAt: accountTokens.usedAt,
    accountId: accounts.id, email: accounts.email, name: accounts.name, active: accounts.active,
  }).from(accountTokens).innerJoin(accounts, eq(accounts.id, accountTokens.accountId))
    .where(eq(accountTokens.tokenHash, hashLinkToken(token))).limit(1)
  if (!row || !row.active) return { ok: false, reason: 'unknown' }
  if (row.usedAt) return { ok: false, reason: 'used' }
  if (row.expiresAt <= now) return { ok: false, reason: 'expired' }
  return { ok: true, tokenId: row.id, purpose: row.purpose as LinkPurpose, account: { id: row.accountId, email: row.email, name: row.name } }
}

export async function shopNameOf(db: Db) {
  const [row] = await db.select({ name: shopSettings.name }).from(shopSettings).limit(1)
  return row?.name || useRuntimeConfig().public.shopName
}

/** The active roster with the address of each welder's active account, for lapse reminders (a welder may have several rows). */
export async function reminderRoster(db: Db) {
  return db.select({ id: welders.id, name: welders.name, stamp: welders.stamp, email: welders.email, accountEmail: accounts.email })
    .from(welders).leftJoin(accounts, and(eq(accounts.welderId, welders.id), eq(accounts.active, true)))
    .where(eq(welders.status, 'active')).orderBy(welders.stamp)
}

/** The active quality manager (supervisor) accounts, who get the weekly lapse digest. */
export async function activeQualityManagers(db: Db) {
  return db.select({ id: accounts.id, name: accounts.name, email: accounts.email }).from(accounts)
    .where(and(eq(accounts.role, 'supervisor'), eq(accounts.active, true))).orderBy(accounts.id)
}

/**
 * The outbox, newest first, with each message's body and delivery state. A one-time link is a credential: unless
 * `showLinks` (a development or test server), the links in the bodies are hidden.
 */
export async function listOutbox(db: Db, query: z.infer<typeof mailListQuerySchema>, showLinks: boolean) {
  const pattern = query.q ? containsPattern(query.q) : ''
  const where = allOf([
    query.q && or(ilike(mailMessages.to, pattern), ilike(mailMessages.subject, pattern)),
    query.status && eq(mailMessages.status, query.status),
    query.kind && eq(mailMessages.kind, query.kind),
  ])
  const [page, byStatus] = await Promise.all([
    pageOf(query, ({ limit, offset }) => db.select().from(mailMessages).where(where)
      .orderBy(orderOf(mailMessages[query.sort], query.dir), orderOf(mailMessages.id, query.dir)).limit(limit).offset(offset),
    () => db.select({ total: count() }).from(mailMessages).where(where)),
    db.select({ status: mailMessages.status, n: count() }).from(mailMessages).groupBy(mailMessages.status),
  ])
  const hide = (body: string) => body.replace(/(set-password\?token=)[\w-]+/g, '$1hidden')
  return {
    ...page,
    items: showLinks ? page.items : page.items.map(m => ({ ...m, text: hide(m.text), html: hide(m.html) })),
    linksHidden: !showLinks,
    counts: Object.fromEntries(byStatus.map(s => [s.status, s.n])) as Partial<Record<'queued' | 'sent' | 'failed', number>>,
  }
}

/** Queues a message that failed every attempt once more, and sends the queue. */
export async function retryMail(db: Db, user: SessionUser, id: number) {
  const requeued = await db.transaction(async (tx) => {
    const done = await requeueMail(tx, id)
    if (done) await recordAudit(tx, { accountId: user.id, action: 'requeue', recordType: 'mail', recordId: id })
    return done
  })
  if (!requeued) return missing('Failed message')
  return sendQueuedMail(db)
}
