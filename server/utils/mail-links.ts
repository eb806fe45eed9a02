import { createHash, randomBytes } from 'node:crypto'
import type { H3Event } from 'h3'
import { and, eq, isNull } from 'drizzle-orm'
import type { Db } from '../database/client'
import { gone, missing } from '../../shared/types/outcome'
import { accountTokens, accounts, shopSettings } from '../database/schema'

// One-time links for invitations and password resets. The link carries 32 random bytes; the database keeps only
// their SHA-256, so a copy of the database cannot be turned into working links.

export type LinkPurpose = 'invitation' | 'password-reset'
export function linkLifetimeHours(purpose: LinkPurpose) {
  return purpose === 'invitation' ? Number(useRuntimeConfig().invitationHours) || 7 * 24 : 1
}

export function hashLinkToken(token: string) {
  return createHash('sha256').update(token, 'utf8').digest('hex')
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

export const linkProblemWords: Record<'unknown' | 'used' | 'expired', string> = {
  unknown: 'This link is not valid. Ask your quality manager for a new invitation, or request a new password reset.',
  used: 'This link has already been used. Sign in, or request a new password reset.',
  expired: 'This link has expired. Request a new password reset, or ask your quality manager to send the invitation again.',
}

/** The public address for links in e-mail: NUXT_APP_URL, else the origin of AUTH_ORIGIN, else the request's own. */
export function appUrl(event?: H3Event) {
  const configured = useRuntimeConfig().appUrl || ''
  if (configured) return configured.replace(/\/$/, '')
  const authOrigin = process.env.AUTH_ORIGIN
  if (authOrigin) {
    try {
      return new URL(authOrigin).origin
    }
    catch { /* fall through */ }
  }
  if (event) return getRequestURL(event, { xForwardedHost: true, xForwardedProto: true }).origin
  return 'http://localhost:3000'
}

export function setPasswordUrl(base: string, token: string) {
  return `${base}/set-password?token=${encodeURIComponent(token)}`
}

export async function shopNameOf(db: Db) {
  const [row] = await db.select({ name: shopSettings.name }).from(shopSettings).limit(1)
  return row?.name || useRuntimeConfig().public.shopName
}

/** Missing (404) for a link that never existed, gone (410) for one used or expired. */
export function linkProblem(reason: 'unknown' | 'used' | 'expired') {
  return reason === 'unknown' ? missing('Link', linkProblemWords[reason]) : gone(linkProblemWords[reason], `Link ${reason}`)
}
