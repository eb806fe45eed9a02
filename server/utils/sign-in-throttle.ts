import type { H3Event } from 'h3'
import { isIP } from 'node:net'
import type { Db } from '../database/client'
import { accountToTell } from '../database/accounts'
import { renderLetter } from './mail-letter'
import { queueMail, shopNameOf } from '../database/mail'
import { sendSoon } from './mail'
import { appUrl } from './mail-links'

// Failed sign-ins are counted in the database (sign_in_failures, queries in server/database/sign-in.ts), per account ('account:<e-mail>') and per client
// address ('address:<ip>'), so every app server sees the same counts and a restart does not forget them.
// - After FREE_FAILURES failures each further attempt waits 250 ms, 500 ms, 1 s ... up to MAX_DELAY_MS.
// - At ACCOUNT_LIMIT failures for an account (ADDRESS_LIMIT for an address) sign-in is refused (429) for LOCK_MINUTES;
//   the account's owner is e-mailed. Counts start over after WINDOW_MINUTES without a failure, and a successful
//   sign-in clears its account's count.
// - Every attempt is counted before the password is checked, so fifty attempts sent at once cannot all slip under
//   the limit.
export const FREE_FAILURES = 3
export const MAX_DELAY_MS = 4000
export const ACCOUNT_LIMIT = 10
export const ADDRESS_LIMIT = 50
export const LOCK_MINUTES = 15
export const WINDOW_MINUTES = 15

export interface ThrottleKey { key: string, limit: number }

export interface Reservation {
  keys: ThrottleKey[]
  /** The highest count among the keys, this attempt included. */
  attempt: number
}

export type Reserve = { ok: true, reservation: Reservation, delayMs: number } | { ok: false, retryAfterSeconds: number }

export function signInKeys(email: string, address: string | null): ThrottleKey[] {
  return [
    { key: `account:${email.trim().toLowerCase()}`, limit: ACCOUNT_LIMIT },
    ...(address ? [{ key: `address:${address}`, limit: ADDRESS_LIMIT }] : []),
  ]
}

/** The wait before checking the password of the n-th attempt in a row (n counts this one). */
export function delayForAttempt(n: number) {
  if (n <= FREE_FAILURES) return 0
  return Math.min(MAX_DELAY_MS, 250 * 2 ** (n - FREE_FAILURES - 1))
}

function trustedProxies(): string[] {
  const configured = String(useRuntimeConfig().trustedProxies || process.env.NUXT_TRUSTED_PROXIES || '')
  return configured.split(',').map(s => normalise(s.trim())).filter(Boolean)
}

function normalise(address: string | undefined | null) {
  if (!address) return ''
  return address.startsWith('::ffff:') && isIP(address.slice(7)) === 4 ? address.slice(7) : address
}

/**
 * The client's address: the socket's peer, unless that peer is a configured trusted proxy (NUXT_TRUSTED_PROXIES,
 * comma-separated addresses); then the right-most X-Forwarded-For entry that is not itself a trusted proxy.
 */
export function clientAddress(event: H3Event, trusted = trustedProxies()): string | null {
  const peer = normalise(event.node.req.socket?.remoteAddress)
  if (!peer) return null
  if (!trusted.includes(peer)) return peer
  const forwarded = String(getRequestHeader(event, 'x-forwarded-for') ?? '').split(',').map(s => normalise(s.trim())).filter(Boolean)
  for (let i = forwarded.length - 1; i >= 0; i--) {
    const hop = forwarded[i]!
    if (!trusted.includes(hop)) return isIP(hop) ? hop : peer
  }
  return peer
}

/** Tells the account's owner that sign-in was locked after repeated failures (once per lock). */
export async function mailAccountLocked(db: Db, accountId: number, now = new Date()) {
  const account = await accountToTell(db, accountId)
  if (!account?.active) return
  const shopName = await shopNameOf(db)
  const body = renderLetter({
    greeting: `Hello ${account.name},`,
    paragraphs: [
      `Someone tried to sign in to your Rootface account ${ACCOUNT_LIMIT} times with a wrong password. Sign-in to your account is paused for ${LOCK_MINUTES} minutes.`,
      'If it was you, wait and try again, or choose a new password with "Forgot your password?" on the sign-in page. If it was not you, tell your quality manager.',
    ],
    action: { label: 'Go to the sign-in page', href: `${appUrl()}/sign-in` },
    footnotes: ['Your password has not been changed and nobody has signed in with it.'],
  }, shopName)
  const queued = await queueMail(db, {
    dedupeKey: `sign-in-locked:${account.id}:${Math.floor(now.getTime() / (LOCK_MINUTES * 60_000))}`,
    kind: 'sign-in-locked', to: account.email, subject: 'Sign-in to your Rootface account is paused', ...body,
  })
  if (queued) sendSoon(db)
}
