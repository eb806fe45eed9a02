import type { H3Event } from 'h3'
import { getToken } from '#auth'
import type { JWT } from 'next-auth/jwt'
import { sessionAccount } from '../database/accounts'

export interface SessionUser {
  id: number
  name: string
  email: string
  role: Role
  welderId: number | null
}

/** A session lasts at most this long from sign-in, however active (README, Configuration). */
export const SESSION_MAX_AGE_SECONDS = 8 * 60 * 60

/** The development default of AUTH_SECRET; a production server refuses to start with it (server/plugins/database.ts). */
export const DEVELOPMENT_AUTH_SECRET = 'rootface-development-secret-change-me'

/** The secret that signs session tokens: AUTH_SECRET, else the runtime config (the development default). */
export function authSecret() {
  return process.env.AUTH_SECRET || String(useRuntimeConfig().authSecret || '')
}

/**
 * The first line of every API route: 401 when signed out, 403 when the role may not use it.
 * The account row is read on every request: a changed, deactivated or signed-out-everywhere account (its session
 * generation raised) takes effect at once.
 */
export async function requireRole(event: H3Event, allowed: readonly Role[]): Promise<SessionUser> {
  const cached = event.context.rootfaceUser as SessionUser | undefined
  const user = cached ?? await sessionUser(event)
  if (!user) throw createError({ statusCode: 401, statusMessage: 'Sign in first' })
  event.context.rootfaceUser = user
  if (!allowed.includes(user.role)) throw createError({ statusCode: 403, statusMessage: 'Your role may not do this' })
  return user
}

/** The signed-in account of this request, or null when signed out or the session was ended. */
export async function sessionUser(event: H3Event): Promise<SessionUser | null> {
  const token = await getToken({ event, secret: authSecret() }).catch(() => null)
  if (!token || !sessionTokenCurrent(token)) return null
  return loadUser(token.uid!, token.gen ?? 0)
}

/** The token names an account and is younger than the session maximum (from its sign-in, not its last refresh). */
export function sessionTokenCurrent(token: JWT, now = Date.now()) {
  if (!token.uid || typeof token.signedInAt !== 'number') return false
  return now / 1000 - token.signedInAt <= SESSION_MAX_AGE_SECONDS
}

/** The account of a session whose generation is still the account's: active, a known role. */
export async function loadUser(id: number, generation: number): Promise<SessionUser | null> {
  const db = await useDb()
  const row = await sessionAccount(db, id)
  if (!row?.active || !isRole(row.role) || row.generation !== generation) return null
  return { id: row.id, name: row.name, email: row.email, role: row.role, welderId: row.welderId }
}

export const everyone = roles
export const staff = ['supervisor', 'inspector'] as const
