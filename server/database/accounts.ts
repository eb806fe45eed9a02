import bcrypt from 'bcryptjs'
import { and, count, eq, gt, ilike, isNull, ne, or, sql, type SQL } from 'drizzle-orm'
import { linkProblem, setPasswordUrl } from '../utils/mail-links'
import { passwordResetMail, invitationMail } from '../utils/mail-messages'
import { sendQueuedMail } from '../utils/mail'
import { accountLinkState, issueAccountLink, queueMail, shopNameOf } from './mail'
import type { Db } from './client'
import { accountTokens, accounts, mailMessages, welders } from './schema'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'
import { containsPattern, orderOf, pageWindow } from '../utils/list'
import { conflict, fieldFailure, missing, type Outcome } from '../../shared/types/outcome'
import type { AccountInvite, AccountPatch, accountListQuerySchema } from '../../shared/schemas/account'
import type { z } from 'zod'

// Accounts as the supervisor manages them: list, read, invite, change, invite again. Sign-in itself is server/utils/auth.ts.

/** The columns of an account as the accounts screens show it (never the password hash). */
const accountViewColumns = {
  id: accounts.id, email: accounts.email, name: accounts.name, role: accounts.role, active: accounts.active, createdAt: accounts.createdAt,
  welderId: accounts.welderId, welderStamp: welders.stamp, welderName: welders.name,
  hasPassword: sql<boolean>`${accounts.passwordHash} is not null`,
  invitationExpiresAt: sql<string | null>`(select max(${accountTokens.expiresAt}) from ${accountTokens} where ${and(
    eq(accountTokens.accountId, accounts.id), eq(accountTokens.purpose, 'invitation'), isNull(accountTokens.usedAt), gt(accountTokens.expiresAt, sql`now()`),
  )})`,
}

export type AccountState = 'active' | 'invited' | 'deactivated'

export function accountState(row: { active: boolean, hasPassword: boolean }): AccountState {
  if (!row.active) return 'deactivated'
  return row.hasPassword ? 'active' : 'invited'
}

export async function listAccounts(db: Db, query: z.infer<typeof accountListQuerySchema>) {
  const filters: SQL[] = []
  if (query.q) {
    const pattern = containsPattern(query.q)
    filters.push(or(ilike(accounts.name, pattern), ilike(accounts.email, pattern), ilike(welders.stamp, pattern))!)
  }
  if (query.role) filters.push(eq(accounts.role, query.role))
  if (query.active) filters.push(eq(accounts.active, query.active === 'true'))
  const where = filters.length ? and(...filters) : undefined
  const { limit, offset } = pageWindow(query)
  const [items, [totals]] = await Promise.all([
    db.select(accountViewColumns).from(accounts).leftJoin(welders, eq(welders.id, accounts.welderId)).where(where)
      .orderBy(orderOf(accounts[query.sort], query.dir), accounts.id).limit(limit).offset(offset),
    db.select({ total: count() }).from(accounts).leftJoin(welders, eq(welders.id, accounts.welderId)).where(where),
  ])
  return { items: items.map(a => ({ ...a, state: accountState(a) })), total: totals?.total ?? 0, page: query.page, pageSize: query.pageSize }
}

export async function findAccount(db: Db, id: number) {
  const [row] = await db.select(accountViewColumns).from(accounts).leftJoin(welders, eq(welders.id, accounts.welderId)).where(eq(accounts.id, id)).limit(1)
  return row ? { ...row, state: accountState(row) } : missing('Account')
}

/** The roster entry exists and no other account is linked to it; null when so. */
async function welderLinkProblem(db: Db, welderId: number, exceptAccountId?: number) {
  const [welder] = await db.select({ id: welders.id }).from(welders).where(eq(welders.id, welderId)).limit(1)
  if (!welder) return fieldFailure('welderId', 'No such welder on the roster')
  const [linked] = await db.select({ id: accounts.id, email: accounts.email }).from(accounts).where(eq(accounts.welderId, welderId)).limit(1)
  if (linked && linked.id !== exceptAccountId) return conflict(`This welder is already linked to the account ${linked.email}`, 'welderId')
  return null
}

/** Opens an account without a password and queues its invitation; `base` is the app's address for the link. */
export async function inviteAccount(db: Db, user: SessionUser, body: AccountInvite, base: string) {
  const email = body.email.toLowerCase()
  const [taken] = await db.select({ id: accounts.id }).from(accounts).where(eq(sql`lower(${accounts.email})`, email)).limit(1)
  if (taken) return conflict('An account with this e-mail address exists already', 'email')
  const problem = body.welderId ? await welderLinkProblem(db, body.welderId) : null
  if (problem) return problem
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
  return { id: account.id, email: account.email, name: account.name, role: account.role, welderId: account.welderId, state: 'invited' as const }
}

/** Renames, links a welder account, deactivates or reactivates; never one's own deactivation, never the last supervisor. */
export async function updateAccount(db: Db, user: SessionUser, id: number, patch: AccountPatch): Promise<Outcome<{ id: number, name: string, role: string, welderId: number | null, active: boolean }>> {
  const [before] = await db.select({ id: accounts.id, name: accounts.name, role: accounts.role, welderId: accounts.welderId, active: accounts.active })
    .from(accounts).where(eq(accounts.id, id)).limit(1)
  if (!before) return missing('Account')
  if (patch.welderId !== undefined) {
    if (before.role !== 'welder') return fieldFailure('welderId', 'Only a welder account links to the roster')
    const problem = await welderLinkProblem(db, patch.welderId, id)
    if (problem) return problem
  }
  if (patch.active === false && before.active) {
    if (id === user.id) return conflict('You cannot deactivate your own account', 'active')
    if (before.role === 'supervisor') {
      const [others] = await db.select({ n: count() }).from(accounts)
        .where(and(eq(accounts.role, 'supervisor'), eq(accounts.active, true), ne(accounts.id, id)))
      if (!others?.n) return conflict('This is the last active quality manager account', 'active')
    }
  }
  return db.transaction(async (tx) => {
    const [row] = await tx.update(accounts).set({
      ...(patch.name !== undefined ? { name: patch.name } : {}),
      ...(patch.welderId !== undefined ? { welderId: patch.welderId } : {}),
      ...(patch.active !== undefined ? { active: patch.active } : {}),
    }).where(eq(accounts.id, id)).returning({ id: accounts.id, name: accounts.name, role: accounts.role, welderId: accounts.welderId, active: accounts.active })
    // A deactivated account's open links stop working at once.
    if (patch.active === false) await tx.delete(accountTokens).where(and(eq(accountTokens.accountId, id), isNull(accountTokens.usedAt)))
    // Deactivation, reactivation and a new welder link end the account's sessions (a reactivated account signs in afresh).
    if ((patch.active !== undefined && patch.active !== before.active) || (patch.welderId !== undefined && patch.welderId !== before.welderId)) await endSessions(tx, id)
    await recordAudit(tx, { accountId: user.id, action: patch.active === false ? 'deactivate' : patch.active === true && !before.active ? 'reactivate' : 'update', recordType: 'account', recordId: id, before, after: row })
    return row!
  })
}

/** A new invitation link (the earlier one stops working) for an active account without a password. */
export async function reinviteAccount(db: Db, user: SessionUser, id: number, base: string) {
  const [account] = await db.select().from(accounts).where(eq(accounts.id, id)).limit(1)
  if (!account) return missing('Account')
  if (!account.active) return conflict('The account is deactivated: reactivate it first')
  if (account.passwordHash) return conflict('This account has a password already; its holder can reset it from the sign-in page')
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
  return { id, expiresAt: link.expiresAt }
}

// At most one reset e-mail per account in each ten-minute window.
const resetWindowMinutes = 10

/** E-mails a reset link if an active account has this address; nothing happens otherwise (the caller answers the same). */
export async function requestPasswordReset(db: Db, email: string, base: string) {
  const [account] = await db.select({ id: accounts.id, name: accounts.name, email: accounts.email }).from(accounts)
    .where(and(eq(sql`lower(${accounts.email})`, email), eq(accounts.active, true))).limit(1)
  if (!account) return
  const dedupeKey = `password-reset:${account.id}:${Math.floor(Date.now() / (resetWindowMinutes * 60_000))}`
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

/** Sets the password with a one-time link; the link is claimed in the statement that checks it, so it works once. */
export async function setPasswordWithLink(db: Db, token: string, password: string) {
  const state = await accountLinkState(db, token)
  if (!state.ok) return linkProblem(state.reason)
  const passwordHash = await bcrypt.hash(password, 10)
  const done = await db.transaction(async (tx) => {
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
  if (!done) return linkProblem('used')
  return { email: state.account.email }
}

/**
 * Ends every session of the account (every device): sign-out, "sign out of all devices", password change or reset,
 * role change, deactivation and reactivation. Run it inside the transaction that makes the change.
 */
export async function endSessions(db: Db, accountId: number) {
  await db.update(accounts).set({ sessionGeneration: sql`${accounts.sessionGeneration} + 1` }).where(eq(accounts.id, accountId))
}

/** "Sign out of all devices": ends every session of the account (one's own, or any account for the supervisor). */
export async function signOutEverywhere(db: Db, user: SessionUser, accountId: number): Promise<Outcome<{ signedOut: true }>> {
  const done = await db.transaction(async (tx) => {
    const [row] = await tx.select({ id: accounts.id }).from(accounts).where(eq(accounts.id, accountId)).limit(1)
    if (!row) return false
    await endSessions(tx, accountId)
    await recordAudit(tx, { accountId: user.id, action: 'sign-out-everywhere', recordType: 'account', recordId: accountId })
    return true
  })
  return done ? { signedOut: true } : missing('Account')
}

/** The account an e-mail address signs in to (any case), with its password hash: the sign-in route compares it. */
export async function accountForSignIn(db: Db, email: string) {
  const [account] = await db.select().from(accounts).where(eq(sql`lower(${accounts.email})`, email.toLowerCase())).limit(1)
  return account
}

/** The account behind a session token, as every request reads it (server/utils/auth.ts decides if it still holds). */
export async function sessionAccount(db: Db, id: number) {
  const [row] = await db.select({
    id: accounts.id, name: accounts.name, email: accounts.email, role: accounts.role, welderId: accounts.welderId, active: accounts.active,
    generation: accounts.sessionGeneration,
  }).from(accounts).where(eq(accounts.id, id)).limit(1)
  return row
}

/** Name, address and whether the account is active: enough to tell its owner something by e-mail. */
export async function accountToTell(db: Db, id: number) {
  const [account] = await db.select({ id: accounts.id, name: accounts.name, email: accounts.email, active: accounts.active })
    .from(accounts).where(eq(accounts.id, id)).limit(1)
  return account
}
