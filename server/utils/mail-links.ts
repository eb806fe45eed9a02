import { createHash } from 'node:crypto'
import type { H3Event } from 'h3'
import { gone, missing } from '../../shared/types/outcome'

// One-time links for invitations and password resets. The link carries 32 random bytes; the database keeps only
// their SHA-256, so a copy of the database cannot be turned into working links. Issuing and reading a link are
// queries: server/database/mail.ts (issueAccountLink, accountLinkState).

export type LinkPurpose = 'invitation' | 'password-reset'
export function linkLifetimeHours(purpose: LinkPurpose) {
  return purpose === 'invitation' ? Number(useRuntimeConfig().invitationHours) || 7 * 24 : 1
}

export function hashLinkToken(token: string) {
  return createHash('sha256').update(token, 'utf8').digest('hex')
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

/** Missing (404) for a link that never existed, gone (410) for one used or expired. */
export function linkProblem(reason: 'unknown' | 'used' | 'expired') {
  return reason === 'unknown' ? missing('Link', linkProblemWords[reason]) : gone(linkProblemWords[reason], `Link ${reason}`)
}
